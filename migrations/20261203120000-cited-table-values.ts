import type { MigrationContext } from "@/lib/db/migrator";
import { CITED_UPDATE_NOTE, publishCitedUpdate } from "@/lib/tables/db/cited-update";

// Carries the cited material tables (lib/tables: every row names its table, edition and where it was
// checked; Spruce-Pine-Fir Select Structural Fb 1,250 psi) into a database that already holds versions,
// as one new published version on top of the current one. Earlier versions stay as they were, so jobs
// saved on them keep their numbers. Rows an admin changed are kept and named in the version's note.
// A database with no version yet is left alone: the starter-tables seeder loads the cited tables.

export async function up(_: { context: MigrationContext }): Promise<void> {
  await publishCitedUpdate();
}

export async function down({ context: { sequelize } }: { context: MigrationContext }): Promise<void> {
  // Takes back the version this migration published while it is still the newest; a version published
  // after it was built on it, and is left alone (history is never rewritten from the middle).
  await sequelize.query(`DELETE FROM table_versions WHERE source = 'seed' AND note LIKE :note AND number = (SELECT MAX(number) FROM table_versions)`, {
    replacements: { note: `${CITED_UPDATE_NOTE}%` },
  });
}
