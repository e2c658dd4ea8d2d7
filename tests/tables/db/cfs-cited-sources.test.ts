import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { getSequelize } from "@/lib/db";
import { STARTER_TABLES } from "@/lib/tables";
import { CFS_SOURCE } from "@/lib/tables/cold-formed";
import { resetTablesCache } from "@/lib/tables/current";
import { loadVersion } from "@/lib/tables/db/queries";
import { seedTables } from "@/lib/tables/db/write";
import type { MaterialTables } from "@/lib/tables/types";
import { TableVersion } from "@/models/material-tables";
import { CFS_SOURCES_NOTE, down as migrationDown, up as migrationUp } from "@/migrations/20261205090000-cfs-cited-sources";
import { TEST_DB, useOwnMigratedDatabase, type OwnDatabase } from "./support";

// The cold-formed sections' renewed source reaches a database that already holds versions as one new
// version: rows still holding the starter's numbers take the new words; an admin's edit and an admin's
// removal stand; every other table is as it was.

const OLD_SOURCE =
  "SSMA product catalog steel thickness and lip tables (t, R, lip) checked against a published copy; properties from memory — verify against a maker's table";

function before(): MaterialTables {
  const t = structuredClone(STARTER_TABLES) as MaterialTables;
  t.version = "starter-cfs-from-memory";
  for (const s of t.coldFormed ?? []) s.source = OLD_SOURCE;
  t.coldFormed!.find((s) => s.name === "800S162-54")!.Ix = 5.8; // an admin's edit
  t.coldFormed = t.coldFormed!.filter((s) => s.name !== "1200S162-97"); // an admin removed it
  return t;
}

let db: OwnDatabase;

describe.skipIf(!TEST_DB)("the cold-formed sources migration", () => {
  beforeAll(async () => {
    db = await useOwnMigratedDatabase("cfssrc");
    resetTablesCache();
  });

  afterAll(async () => {
    await getSequelize().close();
    await db.drop();
  });

  const ctx = () => ({ context: { queryInterface: getSequelize().getQueryInterface(), sequelize: getSequelize() } });

  test("does nothing on an empty database", async () => {
    await migrationUp(ctx());
    expect(await TableVersion.count()).toBe(0);
  });

  test("publishes one version with the new words; edits and removals stand; again changes nothing; down takes it back", async () => {
    const v1 = await seedTables(before(), "Starter tables");
    const v1Id = v1!.version!.id;

    await migrationUp(ctx());
    const versions = await TableVersion.findAll({ order: [["number", "ASC"]] });
    expect(versions.map((v) => v.number)).toEqual([1, 2]);
    expect(versions[1].note).toBe(CFS_SOURCES_NOTE);

    const now = (await loadVersion(versions[1].id))!;
    const then = (await loadVersion(v1Id))!;
    const cfs = now.coldFormed ?? [];
    expect(cfs.find((s) => s.name === "800S162-43")!.source).toBe(CFS_SOURCE);
    expect(cfs.find((s) => s.name === "800S162-54")!.source).toBe(OLD_SOURCE);
    expect(cfs.find((s) => s.name === "800S162-54")!.Ix).toBe(5.8);
    expect(cfs.some((s) => s.name === "1200S162-97")).toBe(false);
    expect(cfs).toHaveLength((then.coldFormed ?? []).length);
    expect(now.sawnValues).toEqual(then.sawnValues);
    expect((then.coldFormed ?? []).every((s) => s.source === OLD_SOURCE)).toBe(true);

    await migrationUp(ctx());
    expect(await TableVersion.count()).toBe(2);

    await migrationDown(ctx());
    expect((await TableVersion.findAll()).map((v) => v.number)).toEqual([1]);
  });
});
