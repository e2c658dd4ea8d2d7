import type { MigrationContext } from "@/lib/db/migrator";
import { STARTER_TABLES } from "@/lib/tables";
import { HEM_FIR_TIMBER_NOTE, publishCitedUpdate } from "@/lib/tables/db/cited-update";

// Carries the renewed source of NDS Supplement 2018 Table 4D Hem-Fir No.2 beams and stringers (now checked
// against a published worked problem, no longer flagged from memory; the values are unchanged) into a
// database that already holds versions, as one new published version on top of the current one, the way
// 20261205110000-cited-timber-sources.ts does. Rows an admin changed are kept and named in the note.

export async function up(_: { context: MigrationContext }): Promise<void> {
  await publishCitedUpdate(STARTER_TABLES, HEM_FIR_TIMBER_NOTE);
}

export async function down({ context: { sequelize } }: { context: MigrationContext }): Promise<void> {
  // Takes back the version this migration published while it is still the newest (history is never rewritten from the middle).
  await sequelize.query(`DELETE FROM table_versions WHERE source = 'seed' AND note LIKE :note AND number = (SELECT MAX(number) FROM table_versions)`, {
    replacements: { note: `${HEM_FIR_TIMBER_NOTE}%` },
  });
}
