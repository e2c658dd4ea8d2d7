import { afterAll, beforeAll, describe, expect, test, vi } from "vitest";
import { Sequelize } from "sequelize";
import { getSequelize } from "@/lib/db";
import { STARTER_TABLES } from "@/lib/tables";
import {
  getCurrentTables,
  getTablesVersion,
  resetTablesCache,
  startTablesListener,
  stopTablesListener,
  tablesListenerIsUp,
  TablesVersionNotFoundError,
} from "@/lib/tables/current";
import { tablesCache } from "@/lib/tables/db/cache";
import { TablesChangeError } from "@/lib/tables/db/errors";
import { diffVersions, getVersionDetail, listVersions } from "@/lib/tables/db/queries";
import { tablesToRows } from "@/lib/tables/db/rows";
import { commitVersion, deleteRow, importRows, restoreVersion, saveRow, seedTables, TABLE_VERSIONS_CHANNEL, type Actor } from "@/lib/tables/db/write";
import { diffRows } from "@/lib/tables/db/diff";
import type { SawnDesignValues } from "@/lib/tables/types";
import { TableVersion } from "@/models/material-tables";
import { makeAdmin, TEST_DB, useOwnMigratedDatabase, type OwnDatabase } from "./support";

// Versioning of the material tables on a real PostgreSQL database of this file's own.

let db: OwnDatabase;
let admin: Actor;

const DF_NO2 = (v: SawnDesignValues) => v.species === "Douglas Fir-Larch" && v.grade === "No.2" && v.sizeClass === "dimension";

async function versionCount(): Promise<number> {
  return TableVersion.count();
}

describe.skipIf(!TEST_DB)("material table versions", () => {
  beforeAll(async () => {
    db = await useOwnMigratedDatabase("versions");
    resetTablesCache();
    admin = await makeAdmin();
  });

  afterAll(async () => {
    await stopTablesListener();
    await getSequelize().close();
    await db.drop();
  });

  test("an empty database serves the starter tables, and seeding publishes them as version 1 unchanged", async () => {
    expect((await getCurrentTables()).version).toBe(STARTER_TABLES.version);
    // Nothing can be edited or imported until the starter tables are published.
    await expect(importRows("steel-grades", [{ name: "A36", Fy: 36, Fu: 58 }], "merge", { actor: admin, note: "too early" })).rejects.toMatchObject({
      status: 409,
    });
    expect(await versionCount()).toBe(0);
    const seeded = await seedTables(STARTER_TABLES, "Starter tables");
    expect(seeded?.created).toBe(true);
    const current = await getCurrentTables();
    expect(current.version).not.toBe(STARTER_TABLES.version);
    // Every row reads back exactly as it was written.
    expect(diffRows(tablesToRows(STARTER_TABLES), tablesToRows(current))).toEqual({ tables: {}, added: 0, changed: 0, removed: 0 });
    const { versions } = await listVersions();
    expect(versions).toHaveLength(1);
    expect(versions[0]).toMatchObject({ number: 1, source: "seed", note: "Starter tables", createdBy: null });
    expect(await seedTables(STARTER_TABLES, "again")).toBeNull();
  });

  test("an edit publishes version N+1; a version loaded before the edit keeps its old numbers", async () => {
    const before = await getCurrentTables();
    const oldRow = before.sawnValues.find(DF_NO2);
    expect(oldRow?.Fb).toBe(900);
    if (!oldRow) throw new Error("starter tables lack DF-L No.2");

    const result = await saveRow(
      { table: "sawn-values", row: { ...oldRow, Fb: 875 }, originalKey: "Douglas Fir-Larch|No.2|dimension|all" },
      { actor: admin, note: "Grading agency correction", baseVersionId: before.version },
    );
    expect(result.created).toBe(true);
    if (!result.created) return;
    expect(result.version).toMatchObject({ number: 2, source: "edit", note: "Grading agency correction", createdBy: { id: admin.id, email: admin.email } });
    expect(result.summary.changed).toBe(1);
    expect(result.summary.tables["sawn-values"]?.changed[0].fields).toEqual([{ column: "Fb_psi", before: "900", after: "875" }]);

    // The next sizing reads the new value at once.
    const after = await getCurrentTables();
    expect(after.version).toBe(result.version.id);
    expect(after.sawnValues.find(DF_NO2)?.Fb).toBe(875);

    // The object a request already held is untouched, and the old version reloads with its numbers
    // (a job sheet saved with version 1 reprints with Fb 900), also from a cold cache.
    expect(before.sawnValues.find(DF_NO2)?.Fb).toBe(900);
    resetTablesCache();
    const reprint = await getTablesVersion(before.version);
    expect(reprint.sawnValues.find(DF_NO2)?.Fb).toBe(900);
    expect(reprint.version).toBe(before.version);

    // Copy-on-write: the other tables were copied whole into the new version.
    expect(diffRows(tablesToRows(before), tablesToRows(after)).changed).toBe(1);
    expect(await diffVersions(before.version, after.version)).toMatchObject({ changed: 1, added: 0, removed: 0 });
  });

  test("an edit made against an older version is refused with 409 and writes nothing", async () => {
    const { versions } = await listVersions();
    const oldest = versions[versions.length - 1];
    const count = await versionCount();
    const grade = STARTER_TABLES.steelGrades[0];
    await expect(
      saveRow({ table: "steel-grades", row: { ...grade, Fu: 66 }, originalKey: grade.name }, { actor: admin, note: "x", baseVersionId: oldest.id }),
    ).rejects.toMatchObject({
      status: 409,
    });
    expect(await versionCount()).toBe(count);
  });

  test("a change that changes nothing publishes no version", async () => {
    const current = await getCurrentTables();
    const count = await versionCount();
    const grade = current.steelGrades[0];
    const result = await saveRow(
      { table: "steel-grades", row: { ...grade }, originalKey: grade.name },
      { actor: admin, note: "no-op", baseVersionId: current.version },
    );
    expect(result.created).toBe(false);
    expect(await versionCount()).toBe(count);
  });

  test("adding a row whose key exists, or editing a missing row, is refused", async () => {
    const current = await getCurrentTables();
    const grade = current.steelGrades[0];
    await expect(saveRow({ table: "steel-grades", row: grade }, { actor: admin, note: "dup" })).rejects.toMatchObject({ status: 409 });
    await expect(saveRow({ table: "steel-grades", row: grade, originalKey: "A1011" }, { actor: admin, note: "missing" })).rejects.toMatchObject({
      status: 404,
    });
    await expect(deleteRow("steel-grades", "A1011", { actor: admin, note: "missing" })).rejects.toBeInstanceOf(TablesChangeError);
  });

  test("a failure inside the transaction leaves no half-written version", async () => {
    const count = await versionCount();
    const rowsBefore = await getSequelize().query("SELECT count(*)::int AS n FROM steel_grades", { plain: true });
    await expect(
      commitVersion({ source: "edit", note: "breaks", actor: admin }, (current) => ({
        ...current,
        // Two rows with one key: the unique index refuses the insert after the version row was written.
        "steel-grades": [...current["steel-grades"], { name: "A992", Fy: 50, Fu: 65 }, { name: "A992", Fy: 50, Fu: 70 }],
      })),
    ).rejects.toThrow();
    expect(await versionCount()).toBe(count);
    expect(await getSequelize().query("SELECT count(*)::int AS n FROM steel_grades", { plain: true })).toEqual(rowsBefore);
  });

  test("delete and import publish versions; importing the same rows twice publishes only once", async () => {
    const start = await getCurrentTables();
    const removed = await deleteRow("steel-grades", "A36", { actor: admin, note: "no A36 in stock" });
    expect(removed.created && removed.summary.removed).toBe(1);
    expect((await getCurrentTables()).steelGrades.map((g) => g.name)).not.toContain("A36");

    const rows = [
      { name: "A36", Fy: 36, Fu: 58 },
      { name: "A572-50", Fy: 50, Fu: 65 },
    ];
    const count = await versionCount();
    const first = await importRows("steel-grades", rows, "merge", { actor: admin, note: "import" });
    expect(first.created).toBe(true);
    expect(first.summary.added).toBe(2);
    const second = await importRows("steel-grades", rows, "merge", { actor: admin, note: "import again" });
    expect(second.created).toBe(false);
    expect(await versionCount()).toBe(count + 1);

    // "replace": the table becomes exactly the file.
    const replaced = await importRows("steel-grades", [{ name: "A992", Fy: 50, Fu: 65 }], "replace", { actor: admin, note: "only A992" });
    expect(replaced.created && replaced.summary.removed).toBe(2);
    expect((await getCurrentTables()).steelGrades).toEqual([{ name: "A992", Fy: 50, Fu: 65 }]);
    expect((await getTablesVersion(start.version)).steelGrades).toHaveLength(2);
  });

  test("restoring version K publishes a new version equal to K, recording where it came from", async () => {
    const { versions } = await listVersions();
    const v1 = versions.find((v) => v.number === 1);
    if (!v1) throw new Error("no version 1");
    const result = await restoreVersion(v1.id, { actor: admin, note: "back to the starter tables" });
    expect(result.created).toBe(true);
    if (!result.created) return;
    expect(result.version).toMatchObject({ source: "restore", restoredFrom: { id: v1.id, number: 1 } });
    expect(result.version.number).toBe(versions[0].number + 1);
    const current = await getCurrentTables();
    expect(current.version).toBe(result.version.id);
    expect(diffRows(tablesToRows(await getTablesVersion(v1.id)), tablesToRows(current))).toMatchObject({ added: 0, changed: 0, removed: 0 });
    expect(current.sawnValues.find(DF_NO2)?.Fb).toBe(900);

    const detail = await getVersionDetail(result.version.id);
    expect(detail?.summary.changed).toBeGreaterThan(0);
    // Restoring what is already current publishes nothing.
    expect((await restoreVersion(v1.id, { actor: admin, note: "again" })).created).toBe(false);
    await expect(restoreVersion("00000000-0000-4000-8000-000000000000", { actor: admin, note: "x" })).rejects.toMatchObject({ status: 404 });
  });

  test("an unknown version id is refused by name", async () => {
    await expect(getTablesVersion("00000000-0000-4000-8000-000000000000")).rejects.toBeInstanceOf(TablesVersionNotFoundError);
    await expect(getTablesVersion("not-a-version")).rejects.toBeInstanceOf(TablesVersionNotFoundError);
    expect(await getTablesVersion(STARTER_TABLES.version)).toBe(STARTER_TABLES);
  });

  test("with the listener up, a held version is served without touching the database, and another process's version is picked up at once", async () => {
    await startTablesListener();
    expect(tablesListenerIsUp()).toBe(true);
    const held = await getCurrentTables(); // learns the current id again after LISTEN began
    const spy = vi.spyOn(getSequelize(), "query");
    const again = await getCurrentTables();
    expect(again).toBe(held);
    expect(spy).not.toHaveBeenCalled();
    spy.mockRestore();

    // "Another process": its own connection publishes a version (copying every row) and notifies.
    const other = new Sequelize(db.url, { dialect: "postgres", logging: false });
    const newId = "11111111-2222-4333-8444-555555555555";
    try {
      await other.transaction(async (transaction) => {
        const [[{ n }]] = (await other.query("SELECT max(number) AS n FROM table_versions", { transaction })) as [[{ n: number }], unknown];
        await other.query(
          `INSERT INTO table_versions (id, number, source, note, summary, rows_added, rows_changed, rows_removed, created_at)
           VALUES (:id, :n, 'edit', 'from another process', '{"tables":{},"added":0,"changed":0,"removed":0}', 0, 0, 0, now())`,
          { replacements: { id: newId, n: n + 1 }, transaction },
        );
        await other.query(
          `INSERT INTO steel_grades (id, version_id, name, fy_ksi, fu_ksi) SELECT gen_random_uuid(), :id, name, fy_ksi, fu_ksi + 1 FROM steel_grades WHERE version_id = :old`,
          { replacements: { id: newId, old: held.version }, transaction },
        );
        await other.query("SELECT pg_notify(:channel, :id)", { replacements: { channel: TABLE_VERSIONS_CHANNEL, id: newId }, transaction });
      });
    } finally {
      await other.close();
    }
    await vi.waitFor(() => expect(tablesCache().currentId).toBeNull(), { timeout: 3000, interval: 20 });
    const picked = await getCurrentTables();
    expect(picked.version).toBe(newId);
    expect(picked.steelGrades[0].Fu).toBe(held.steelGrades[0].Fu + 1);
  });
});
