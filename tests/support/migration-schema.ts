import { randomUUID } from "node:crypto";
import { QueryTypes, Sequelize } from "sequelize";
import type { MigrationContext } from "@/lib/db/migrator";

/**
 * A schema of one migration test's own on the test database, reached through search_path, so the
 * migration's up and down never touch the shared test database's tables.
 */
export interface MigrationSchema {
  name: string;
  /** Connected with search_path set to this schema: unqualified table names land here. */
  sequelize: Sequelize;
  /** What a migration's up and down receive. */
  context: MigrationContext;
  /** The schema's table names, sorted. */
  tables(): Promise<string[]>;
  /** Closes the connections and drops the schema with everything in it. */
  drop(): Promise<void>;
}

export async function createMigrationSchema(url: string, prefix: string): Promise<MigrationSchema> {
  const name = `${prefix}_${randomUUID().slice(0, 8)}`;
  const admin = new Sequelize(url, { dialect: "postgres", logging: false });
  try {
    await admin.query(`CREATE SCHEMA "${name}"`);
  } catch (err) {
    await admin.close();
    throw err;
  }
  const sequelize = new Sequelize(url, { dialect: "postgres", logging: false, dialectOptions: { options: `-c search_path=${name}` } });
  return {
    name,
    sequelize,
    context: { queryInterface: sequelize.getQueryInterface(), sequelize },
    tables: async () =>
      (
        await sequelize.query<{ name: string }>("SELECT table_name AS name FROM information_schema.tables WHERE table_schema = :schema ORDER BY table_name", {
          replacements: { schema: name },
          type: QueryTypes.SELECT,
        })
      ).map((r) => r.name),
    drop: async () => {
      await sequelize.close();
      await admin.query(`DROP SCHEMA IF EXISTS "${name}" CASCADE`);
      await admin.close();
    },
  };
}
