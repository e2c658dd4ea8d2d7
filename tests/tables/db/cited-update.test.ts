import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { getSequelize } from "@/lib/db";
import { STARTER_TABLES } from "@/lib/tables";
import { resetTablesCache } from "@/lib/tables/current";
import { citedUpdate, CITED_UPDATE_NOTE, HEM_FIR_TIMBER_NOTE, publishCitedUpdate, TIMBER_SOURCES_NOTE } from "@/lib/tables/db/cited-update";
import { loadVersion } from "@/lib/tables/db/queries";
import { tablesToRows } from "@/lib/tables/db/rows";
import { seedTables } from "@/lib/tables/db/write";
import type { MaterialTables, SawnDesignValues } from "@/lib/tables/types";
import { TableVersion } from "@/models/material-tables";
import { down as migrationDown, up as migrationUp } from "@/migrations/20261203120000-cited-table-values";
import { down as timberDown, up as timberUp } from "@/migrations/20261205110000-cited-timber-sources";
import { down as hemFirDown, up as hemFirUp } from "@/migrations/20261205130000-cited-hem-fir-timbers";
import { TEST_DB, useOwnMigratedDatabase, type OwnDatabase } from "./support";

// The cited tables reach a database that already holds versions as one new version; the earlier
// versions stay as they were (NDS Supplement 2018 Table 4A: Spruce-Pine-Fir Select Structural Fb
// 1,250 psi; the first starter tables held 1,150).

const SPF_SS = (v: SawnDesignValues) => v.species === "Spruce-Pine-Fir" && v.grade === "Select Structural" && v.sizeClass === "dimension";
const DF_NO2 = (v: SawnDesignValues) => v.species === "Douglas Fir-Larch" && v.grade === "No.2" && v.sizeClass === "dimension";

/** The tables as the first starter version held them: SPF SS Fb 1,150 psi, every sawn source "from memory". */
function firstStarter(): MaterialTables {
  const t = structuredClone(STARTER_TABLES) as MaterialTables;
  t.version = "starter-before-citations";
  for (const v of t.sawnValues) v.source = `${v.source.split(";")[0]} (from memory — verify against the printed table)`;
  t.sawnValues.find(SPF_SS)!.Fb = 1150;
  return t;
}

describe("the cited update, row by row", () => {
  test("corrects the earlier starter value, renews sources, keeps an admin's change, adds missing rows", () => {
    const before = firstStarter();
    before.sawnValues.find(DF_NO2)!.Fb = 850; // an admin's edit
    before.engineered = before.engineered.filter((e) => e.name !== "PSL 2.0E"); // an admin removed it
    const { rows, kept } = citedUpdate(tablesToRows(before), tablesToRows(STARTER_TABLES));
    const spf = rows["sawn-values"].find(SPF_SS)!;
    expect(spf.Fb).toBe(1250);
    expect(spf.source).toMatch(/checked against/);
    expect(rows["sawn-values"].find(DF_NO2)!.Fb).toBe(850);
    expect(kept).toEqual(["Sawn design values: Douglas Fir-Larch No.2 dimension all"]);
    expect(rows.engineered.some((e) => e.name === "PSL 2.0E")).toBe(true);
    expect(rows["sawn-values"]).toHaveLength(STARTER_TABLES.sawnValues.length);
    expect(rows.costs).toEqual(tablesToRows(before).costs);
  });

  test("an admin's value that happens to be the earlier starter's on another row is not touched", () => {
    const before = firstStarter();
    before.sawnValues.find((v) => v.species === "Hem-Fir" && v.grade === "Select Structural" && v.sizeClass === "dimension")!.Fb = 1150;
    const { kept } = citedUpdate(tablesToRows(before), tablesToRows(STARTER_TABLES));
    expect(kept).toEqual(["Sawn design values: Hem-Fir Select Structural dimension all"]);
  });

  test("over the cited tables themselves it changes nothing", () => {
    const { rows, kept } = citedUpdate(tablesToRows(STARTER_TABLES), tablesToRows(STARTER_TABLES));
    expect(rows).toEqual(tablesToRows(STARTER_TABLES));
    expect(kept).toEqual([]);
  });
});

let db: OwnDatabase;

describe.skipIf(!TEST_DB)("the cited-tables migration on a database seeded with the first starter tables", () => {
  beforeAll(async () => {
    db = await useOwnMigratedDatabase("cited");
    resetTablesCache();
  });

  afterAll(async () => {
    await getSequelize().close();
    await db.drop();
  });

  test("does nothing on an empty database (the seeder loads the cited tables as version 1)", async () => {
    expect(await publishCitedUpdate()).toBeNull();
    expect(await TableVersion.count()).toBe(0);
  });

  test("publishes one new version; version 1 keeps its numbers; running again changes nothing; down takes it back", async () => {
    const first = firstStarter();
    first.sawnValues.find(DF_NO2)!.Fb = 850;
    const v1 = await seedTables(first, "Starter tables");
    expect(v1?.created).toBe(true);
    const v1Id = v1!.version!.id;

    await migrationUp({ context: { queryInterface: getSequelize().getQueryInterface(), sequelize: getSequelize() } });
    const versions = await TableVersion.findAll({ order: [["number", "ASC"]] });
    expect(versions.map((v) => v.number)).toEqual([1, 2]);
    const v2 = versions[1];
    expect(v2.source).toBe("seed");
    expect(v2.note).toContain(CITED_UPDATE_NOTE);
    expect(v2.note).toContain("Douglas Fir-Larch No.2 dimension all");
    expect(v2.createdById).toBeNull();

    const now = (await loadVersion(v2.id))!;
    expect(now.sawnValues.find(SPF_SS)!.Fb).toBe(1250);
    expect(now.sawnValues.find(DF_NO2)!.Fb).toBe(850);
    const then = (await loadVersion(v1Id))!;
    expect(then.sawnValues.find(SPF_SS)!.Fb).toBe(1150);
    expect(then.sawnValues.find(SPF_SS)!.source).toMatch(/from memory/);

    const again = await publishCitedUpdate();
    expect(again?.created).toBe(false);
    expect(await TableVersion.count()).toBe(2);

    await migrationDown({ context: { queryInterface: getSequelize().getQueryInterface(), sequelize: getSequelize() } });
    expect((await TableVersion.findAll()).map((v) => v.number)).toEqual([1]);
  });

  test("the Table 4D sources reach a database as one more version; the earlier version keeps its flagged words", async () => {
    const ctx = { context: { queryInterface: getSequelize().getQueryInterface(), sequelize: getSequelize() } };
    const before = await TableVersion.count();
    expect(before).toBeGreaterThan(0);
    const DFL_NO1_BS = (v: SawnDesignValues) => v.species === "Douglas Fir-Larch" && v.grade === "No.1" && v.sizeClass === "beams-stringers";
    const HF_SS_BS = (v: SawnDesignValues) => v.species === "Hem-Fir" && v.grade === "Select Structural" && v.sizeClass === "beams-stringers";
    const latest = async () => (await TableVersion.findAll({ order: [["number", "DESC"]], limit: 1 }))[0];
    const earlier = await latest();
    expect((await loadVersion(earlier.id))!.sawnValues.find(DFL_NO1_BS)!.source).toMatch(/from memory/);

    await timberUp(ctx);
    const published = await latest();
    expect(published.number).toBe(earlier.number + 1);
    expect(published.note).toContain(TIMBER_SOURCES_NOTE);
    const now = (await loadVersion(published.id))!;
    const dfl = now.sawnValues.find(DFL_NO1_BS)!;
    expect(dfl.source).toMatch(/checked against/);
    expect(dfl.source).not.toMatch(/from memory/);
    expect(dfl.Fb).toBe(1350);
    expect(now.sawnValues.find(HF_SS_BS)!.source).toMatch(/from memory/);
    // frozen: the version before keeps its words
    expect((await loadVersion(earlier.id))!.sawnValues.find(DFL_NO1_BS)!.source).toMatch(/from memory/);

    await timberUp(ctx);
    expect(await TableVersion.count()).toBe(before + 1);
    await timberDown(ctx);
    expect(await TableVersion.count()).toBe(before);
  });
  test("the Table 4D Hem-Fir No.2 source reaches a database as one more version; the version before keeps its flagged words", async () => {
    const ctx = { context: { queryInterface: getSequelize().getQueryInterface(), sequelize: getSequelize() } };
    const before = await TableVersion.count();
    const HF_NO2_BS = (v: SawnDesignValues) => v.species === "Hem-Fir" && v.grade === "No.2" && v.sizeClass === "beams-stringers";
    const latest = async () => (await TableVersion.findAll({ order: [["number", "DESC"]], limit: 1 }))[0];
    const earlier = await latest();
    expect((await loadVersion(earlier.id))!.sawnValues.find(HF_NO2_BS)!.source).toMatch(/from memory/);

    await hemFirUp(ctx);
    const published = await latest();
    expect(published.number).toBe(earlier.number + 1);
    expect(published.note).toContain(HEM_FIR_TIMBER_NOTE);
    const hf = (await loadVersion(published.id))!.sawnValues.find(HF_NO2_BS)!;
    expect(hf.source).toMatch(/Missouri S&T/);
    expect(hf.source).not.toMatch(/from memory/);
    expect([hf.Fb, hf.Fc, hf.E]).toEqual([675, 500, 1_100_000]);
    expect((await loadVersion(earlier.id))!.sawnValues.find(HF_NO2_BS)!.source).toMatch(/from memory/);

    await hemFirUp(ctx);
    expect(await TableVersion.count()).toBe(before + 1);
    await hemFirDown(ctx);
    expect(await TableVersion.count()).toBe(before);
  });
});
