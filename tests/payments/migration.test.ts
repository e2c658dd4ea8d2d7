import { DataTypes } from "sequelize";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { down, up } from "@/migrations/20261201130000-create-billing";
import { createMigrationSchema, type MigrationSchema } from "../support/migration-schema";
import { TEST_DB } from "./support";

// The billing migration, up and down, in a schema of its own (search_path), so the shared test database's
// tables are never touched.
describe.skipIf(!TEST_DB)("migration 20261201130000-create-billing", () => {
  let own: MigrationSchema;

  beforeAll(async () => {
    own = await createMigrationSchema(TEST_DB ?? "", "payments_mig");
    await own.sequelize.getQueryInterface().createTable("users", { id: { type: DataTypes.UUID, primaryKey: true } });
  });

  afterAll(async () => {
    await own?.drop();
  });

  test("up creates the three tables with a unique event id; down removes them; up runs again", async () => {
    const { sequelize: scoped, context, tables } = own;
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
