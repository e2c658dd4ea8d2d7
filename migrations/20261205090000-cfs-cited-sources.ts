import type { MigrationContext } from "@/lib/db/migrator";
import { STARTER_TABLES } from "@/lib/tables";
import { currentVersionId, loadVersionRows } from "@/lib/tables/db/queries";
import { commitVersion } from "@/lib/tables/db/write";
import { rowToFlat, TABLE_SPECS } from "@/lib/tables/schemas";
import type { CfsSection } from "@/lib/tables/types";

// Carries the cold-formed steel sections' renewed source (properties checked against a published copy of
// the SSMA Technical Guide 2024 property table, no longer "from memory") into a database that already
// holds versions, as one new published version; only the cold-formed rows whose numbers are still the
// starter's change (an admin's edit and an admin's removal stand), every other table is copied as it is.
// Nothing is published when nothing changes.

export const CFS_SOURCES_NOTE = "Cold-formed steel sections: properties checked against the SSMA Technical Guide (2024)";

export async function up(_: { context: MigrationContext }): Promise<void> {
  const base = await currentVersionId();
  if (!base) return;
  const current = await loadVersionRows(base);
  if (!current || current["cold-formed"].length === 0) return;
  await commitVersion({ source: "seed", note: CFS_SOURCES_NOTE, actor: null, baseVersionId: base }, (now) => ({
    ...now,
    "cold-formed": now["cold-formed"].map(renewedSource),
  }));
}

const spec = TABLE_SPECS["cold-formed"];
const starterByKey = new Map((STARTER_TABLES.coldFormed ?? []).map((r) => [spec.keyOf(r), r] as const));

/** The starter row when the row still holds the starter's numbers (only the source words change); else the row. */
function renewedSource(row: CfsSection): CfsSection {
  const next = starterByKey.get(spec.keyOf(row));
  if (!next) return row;
  const { source: _a, ...now } = rowToFlat("cold-formed", row);
  const { source: _b, ...starter } = rowToFlat("cold-formed", next);
  const keys = new Set([...Object.keys(now), ...Object.keys(starter)]);
  for (const k of keys) if (now[k] !== starter[k]) return row;
  return next;
}

export async function down({ context: { sequelize } }: { context: MigrationContext }): Promise<void> {
  // Takes back the version this migration published while it is still the newest (history is never rewritten from the middle).
  await sequelize.query(`DELETE FROM table_versions WHERE source = 'seed' AND note = :note AND number = (SELECT MAX(number) FROM table_versions)`, {
    replacements: { note: CFS_SOURCES_NOTE },
  });
}
