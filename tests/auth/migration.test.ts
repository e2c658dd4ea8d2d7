import pg from "pg";
import { QueryTypes, Sequelize } from "sequelize";
import { afterAll, describe, expect, test } from "vitest";
import type { MigrationContext } from "@/lib/db/migrator";
import * as createUsers from "@/migrations/20261201000000-create-users";
import * as authTables from "@/migrations/20261201100000-create-auth-tokens-and-rate-limits";
import * as demoAccounts from "@/seeders/20261201100000-demo-accounts";
import { createOwnDatabase, type OwnDatabase } from "../tables/db/support";
import { TEST_DB } from "./support";

// Up, down and up again in a database of this test's own (made and dropped here), so the shared test
// database is left alone.
let db: OwnDatabase | undefined;
let sequelize: Sequelize | undefined;

function open(url: string): Sequelize {
  return new Sequelize(url, { dialect: "postgres", dialectModule: pg, logging: false });
}

async function tables(s: Sequelize): Promise<string[]> {
  // Aliased: Sequelize reshapes a query that starts "SELECT table_name FROM information_schema.tables".
  const rows = await s.query<{ name: string }>(
    "SELECT t.table_name AS name FROM information_schema.tables t WHERE t.table_schema = 'public' ORDER BY t.table_name",
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.name);
}

afterAll(async () => {
  await sequelize?.close();
  await db?.drop();
});

describe.skipIf(!TEST_DB)("auth migration and demo seed", () => {
  test("up creates the tables, the seed adds three confirmed accounts at cost 12, down undoes both", async () => {
    db = await createOwnDatabase("authmig");
    sequelize = open(db.url);
    const context: MigrationContext = { queryInterface: sequelize.getQueryInterface(), sequelize };

    await createUsers.up({ context });
    await authTables.up({ context });
    expect(await tables(sequelize)).toEqual(["auth_tokens", "rate_limits", "users"]);

    await demoAccounts.up({ context });
    await demoAccounts.up({ context });
    const users = await sequelize.query<{ email: string; role: string; password_hash: string; email_verified_at: Date | null }>(
      "SELECT email, role, password_hash, email_verified_at FROM users ORDER BY email",
      { type: QueryTypes.SELECT },
    );
    expect(users.map((u) => [u.email, u.role])).toEqual([
      ["admin@spanlark.test", "admin"],
      ["dee@hollisrowe.test", "builder"],
      ["sam@hollisrowe.test", "subscriber"],
    ]);
    expect(users.every((u) => u.password_hash.startsWith("$2b$12$") && u.email_verified_at !== null)).toBe(true);

    await demoAccounts.down({ context });
    expect(await sequelize.query("SELECT 1 FROM users", { type: QueryTypes.SELECT })).toHaveLength(0);

    await authTables.down({ context });
    expect(await tables(sequelize)).toEqual(["users"]);
    const columns = await sequelize.query<{ column_name: string }>(
      "SELECT column_name FROM information_schema.columns WHERE table_schema = 'public' AND table_name = 'users'",
      { type: QueryTypes.SELECT },
    );
    expect(columns.map((c) => c.column_name)).not.toContain("password_changed_at");

    await authTables.up({ context });
    expect(await tables(sequelize)).toEqual(["auth_tokens", "rate_limits", "users"]);
  }, 60_000);
});
