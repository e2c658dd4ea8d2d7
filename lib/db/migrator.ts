import path from "node:path";
import { fileURLToPath } from "node:url";
import type { QueryInterface, Sequelize } from "sequelize";
import { SequelizeStorage, Umzug } from "umzug";

/**
 * Migrations (migrations/*.ts) and seeders (seeders/*.ts), run by umzug. Each file is named by timestamp
 * (YYYYMMDDHHMMSS-what.ts) and exports `up` and `down`, both taking `{ context: { queryInterface, sequelize } }`.
 */
export interface MigrationContext {
  queryInterface: QueryInterface;
  sequelize: Sequelize;
}

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../..");

function runner(sequelize: Sequelize, folder: "migrations" | "seeders"): Umzug<MigrationContext> {
  return new Umzug<MigrationContext>({
    migrations: {
      glob: [`${folder}/*.ts`, { cwd: root, ignore: ["**/*.d.ts"] }],
      resolve: ({ name, path: file, context }) => {
        const load = async () =>
          (await import(/* @vite-ignore */ file as string)) as {
            up(p: { context: MigrationContext }): Promise<void>;
            down(p: { context: MigrationContext }): Promise<void>;
          };
        return {
          name,
          up: async () => (await load()).up({ context }),
          down: async () => (await load()).down({ context }),
        };
      },
    },
    context: { queryInterface: sequelize.getQueryInterface(), sequelize },
    // Distinct model names: two storages sharing Sequelize's default model name would share one table.
    storage: new SequelizeStorage(
      folder === "migrations"
        ? { sequelize, tableName: "schema_migrations", modelName: "SchemaMigration" }
        : { sequelize, tableName: "schema_seeds", modelName: "SchemaSeed" },
    ),
    logger: undefined,
  });
}

export const migrator = (sequelize: Sequelize) => runner(sequelize, "migrations");
export const seeder = (sequelize: Sequelize) => runner(sequelize, "seeders");
