import type { MigrationContext } from "@/lib/db/migrator";
import { STARTER_TABLES } from "@/lib/tables";
import { currentVersionId, loadVersionRows } from "@/lib/tables/db/queries";
import { commitVersion } from "@/lib/tables/db/write";

// Carries the starter cold-formed steel sections (lib/tables/cold-formed.ts) into a database that already
// holds versions, as one new published version on top of the current one; every other table is copied as
// it is. A database with no version yet is left alone (the starter-tables seeder loads them), and so is one
// whose current version already holds cold-formed rows.

export const CFS_CARRY_NOTE = "Cold-formed steel C-sections and tracks added (AISI S100-16 properties)";

export async function up(_: { context: MigrationContext }): Promise<void> {
  const base = await currentVersionId();
  if (!base) return;
  const current = await loadVersionRows(base);
  if (!current || current["cold-formed"].length > 0) return;
  await commitVersion({ source: "seed", note: CFS_CARRY_NOTE, actor: null, baseVersionId: base }, (now) => ({
    ...now,
    "cold-formed": STARTER_TABLES.coldFormed ?? [],
  }));
}

export async function down({ context: { sequelize } }: { context: MigrationContext }): Promise<void> {
  // Takes back the version this migration published while it is still the newest (history is never rewritten from the middle).
  await sequelize.query(`DELETE FROM table_versions WHERE source = 'seed' AND note = :note AND number = (SELECT MAX(number) FROM table_versions)`, {
    replacements: { note: CFS_CARRY_NOTE },
  });
}
