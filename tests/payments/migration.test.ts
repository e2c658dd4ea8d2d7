import { randomUUID } from "node:crypto";
import { DataTypes, QueryTypes, Sequelize } from "sequelize";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { down, up } from "@/migrations/20261201130000-create-billing";
import { TEST_DB } from "./support";

// The billing migration, up and down, in a schema of its own (search_path), so the shared test database's
// tables are never touched.
describe.skipIf(!TEST_DB)("migration 20261201130000-create-billing", () => {
  const schema = `payments_mig_${randomUUID().slice(0, 8)}`;
  let admin: Sequelize;
  let scoped: Sequelize;

  const tables = async () =>
    (
      await scoped.query<{ name: string }>("SELECT table_name AS name FROM information_schema.tables WHERE table_schema = :schema ORDER BY table_name", {
        replacements: { schema },
        type: QueryTypes.SELECT,
      })
    ).map((r) => r.name);

  beforeAll(async () => {
    admin = new Sequelize(TEST_DB ?? "", { dialect: "postgres", logging: false });
    await admin.query(`CREATE SCHEMA "${schema}"`);
    scoped = new Sequelize(TEST_DB ?? "", {
      dialect: "postgres",
      logging: false,
      dialectOptions: { options: `-c search_path=${schema}` },
    });
    await scoped.getQueryInterface().createTable("users", { id: { type: DataTypes.UUID, primaryKey: true } });
  });

  afterAll(async () => {
    await scoped?.close();
    await admin?.query(`DROP SCHEMA IF EXISTS "${schema}" CASCADE`);
    await admin?.close();
  });

  test("up creates the three tables with a unique event id; down removes them; up runs again", async () => {
    const context = { queryInterface: scoped.getQueryInterface(), sequelize: scoped };
    await up({ context });
    expect(await tables()).toEqual(["stripe_customers", "stripe_events", "subscriptions", "users"]);
    await scoped.query("INSERT INTO stripe_events (event_id, type, stripe_created_at, outcome, created_at) VALUES ('evt_1', 't', now(), 'applied', now())");
    await expect(
      scoped.query("INSERT INTO stripe_events (event_id, type, stripe_created_at, outcome, created_at) VALUES ('evt_1', 't', now(), 'applied', now())"),
    ).rejects.toThrow();

    await down({ context });
    expect(await tables()).toEqual(["users"]);
    await up({ context });
    expect(await tables()).toHaveLength(4);
  });
});
