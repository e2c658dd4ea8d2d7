import { randomUUID } from "node:crypto";
import { DataTypes, QueryTypes } from "sequelize";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { down, up } from "@/migrations/20261201125000-create-crew-links-and-job-sheets";
import { createMigrationSchema, type MigrationSchema } from "../support/migration-schema";
import { TEST_DB } from "./fixtures";

// The crew link and job sheet migration, up and down, in a schema of its own (search_path), so the shared
// test database's tables are never touched.
describe.skipIf(!TEST_DB)("migration 20261201125000-create-crew-links-and-job-sheets", () => {
  let own: MigrationSchema;

  beforeAll(async () => {
    own = await createMigrationSchema(TEST_DB ?? "", "crew_mig");
    const qi = own.sequelize.getQueryInterface();
    await qi.createTable("users", { id: { type: DataTypes.UUID, primaryKey: true } });
    await qi.createTable("jobs", { id: { type: DataTypes.UUID, primaryKey: true } });
  });

  afterAll(async () => {
    await own?.drop();
  });

  test("up creates both tables (token hash unique; a sheet outlives its job); down removes them; up runs again", async () => {
    const { sequelize: scoped, context, tables } = own;
    await up({ context });
    expect(await tables()).toEqual(["crew_links", "job_sheets", "jobs", "users"]);

    const [user, job] = [randomUUID(), randomUUID()];
    await scoped.query("INSERT INTO users (id) VALUES (:user)", { replacements: { user } });
    await scoped.query("INSERT INTO jobs (id) VALUES (:job)", { replacements: { job } });
    const link =
      "INSERT INTO crew_links (id, job_id, owner_id, token_hash, token_sealed, created_at, updated_at) VALUES (:id, :job, :user, :hash, 'v1.a.b.c', now(), now())";
    const hash = "a".repeat(64);
    await scoped.query(link, { replacements: { id: randomUUID(), job, user, hash } });
    await expect(scoped.query(link, { replacements: { id: randomUUID(), job, user, hash } })).rejects.toThrow();
    const sheet = randomUUID();
    await scoped.query(
      "INSERT INTO job_sheets (id, job_id, owner_id, title, tables_version_id, snapshot, created_at, updated_at) VALUES (:sheet, :job, :user, 't', 'v', '{}', now(), now())",
      { replacements: { sheet, job, user } },
    );
    await scoped.query("DELETE FROM jobs WHERE id = :job", { replacements: { job } });
    const rows = await scoped.query<{ job_id: string | null }>("SELECT job_id FROM job_sheets WHERE id = :sheet", {
      replacements: { sheet },
      type: QueryTypes.SELECT,
    });
    expect(rows).toEqual([{ job_id: null }]);
    expect(await scoped.query("SELECT id FROM crew_links", { type: QueryTypes.SELECT })).toEqual([]);

    await down({ context });
    expect(await tables()).toEqual(["jobs", "users"]);
    await up({ context });
    expect(await tables()).toHaveLength(4);
  });
});
