import type { MigrationContext } from "@/lib/db/migrator";
import { STARTER_TABLES } from "@/lib/tables";
import { publishCitedUpdate, TIMBER_SOURCES_NOTE } from "@/lib/tables/db/cited-update";

// Carries the renewed sources of NDS Supplement 2018 Table 4D (Douglas Fir-Larch beams and stringers,
// now checked against published copies; the values are unchanged) and the lower glulam 24F-V4 Fbx−
// (1,450 psi in place of 1,850, now that the bending check reads Fbx−) into a database that already
// holds versions, as one new published version on top of the current one. Earlier versions stay as they were,
// so sheets frozen on them keep their words; jobs recheck when they see the new version. Rows an admin
// changed are kept and named in the version's note. A database with no version yet is left alone (the
// starter-tables seeder loads the cited tables), and so is one whose current rows already match.

export async function up(_: { context: MigrationContext }): Promise<void> {
  await publishCitedUpdate(STARTER_TABLES, TIMBER_SOURCES_NOTE);
}

export async function down({ context: { sequelize } }: { context: MigrationContext }): Promise<void> {
  // Takes back the version this migration published while it is still the newest (history is never rewritten from the middle).
  await sequelize.query(`DELETE FROM table_versions WHERE source = 'seed' AND note LIKE :note AND number = (SELECT MAX(number) FROM table_versions)`, {
    replacements: { note: `${TIMBER_SOURCES_NOTE}%` },
  });
}
