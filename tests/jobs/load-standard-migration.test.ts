import { randomUUID } from "node:crypto";
import { DataTypes, QueryTypes } from "sequelize";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { down, up } from "@/migrations/20261203090000-record-load-standard-of-saved-members";
import { createMigrationSchema, type MigrationSchema } from "../support/migration-schema";

const TEST_DB = process.env.TEST_DATABASE_URL;

// Members saved before the load basis was a choice were worked out on ASCE 7-22: the migration records that
// in their inputs and answers (numbers unchanged); a member that already names its basis is left alone;
// down takes the recorded basis away again. Run in a schema of its own (search_path).
describe.skipIf(!TEST_DB)("migration 20261203090000-record-load-standard-of-saved-members", () => {
  let own: MigrationSchema;

  beforeAll(async () => {
    own = await createMigrationSchema(TEST_DB ?? "", "basis_mig");
    await own.sequelize.getQueryInterface().createTable("members", {
      id: { type: DataTypes.UUID, primaryKey: true },
      flow_state: { type: DataTypes.JSONB, allowNull: false },
      result_summary: { type: DataTypes.JSONB, allowNull: true },
    });
  });

  afterAll(async () => {
    await own?.drop();
  });

  test("up records ASCE 7-22 on older members only; down removes it; up runs again", async () => {
    const { sequelize: db, context } = own;
    const [older, unsized, newer] = [randomUUID(), randomUUID(), randomUUID()];
    const insert = "INSERT INTO members (id, flow_state, result_summary) VALUES (:id, CAST(:fs AS jsonb), CAST(:rs AS jsonb))";
    await db.query(insert, { replacements: { id: older, fs: JSON.stringify({ kind: "header" }), rs: JSON.stringify({ ratio: 0.77 }) } });
    await db.query(insert, { replacements: { id: unsized, fs: JSON.stringify({ kind: "beam" }), rs: null } });
    await db.query(insert, {
      replacements: {
        id: newer,
        fs: JSON.stringify({ kind: "rafter", loadStandard: "ASCE 7-16" }),
        rs: JSON.stringify({ ratio: 0.5, loadStandard: "ASCE 7-16" }),
      },
    });
    const read = async () =>
      Object.fromEntries(
        (
          await db.query<{ id: string; fs: Record<string, unknown>; rs: Record<string, unknown> | null }>(
            "SELECT id, flow_state AS fs, result_summary AS rs FROM members",
            { type: QueryTypes.SELECT },
          )
        ).map((r) => [r.id, r]),
      );

    await up({ context });
    let rows = await read();
    expect(rows[older].fs).toEqual({ kind: "header", loadStandard: "ASCE 7-22" });
    expect(rows[older].rs).toEqual({ ratio: 0.77, loadStandard: "ASCE 7-22" });
    expect(rows[unsized].fs.loadStandard).toBe("ASCE 7-22");
    expect(rows[unsized].rs).toBeNull();
    expect(rows[newer].fs.loadStandard).toBe("ASCE 7-16");

    await down({ context });
    rows = await read();
    expect(rows[older].fs).toEqual({ kind: "header" });
    expect(rows[older].rs).toEqual({ ratio: 0.77 });
    expect(rows[newer].fs.loadStandard).toBe("ASCE 7-16");

    await up({ context });
    expect((await read())[older].fs.loadStandard).toBe("ASCE 7-22");
  });
});
