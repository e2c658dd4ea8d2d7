import type { MigrationContext } from "@/lib/db/migrator";
import { STARTER_TABLES } from "@/lib/tables";
import { tablesToRows } from "@/lib/tables/db/rows";
import { tablesProblems } from "@/lib/tables/db/validate";
import { seedTables } from "@/lib/tables/db/write";

// Loads the starter tables that ship in lib/tables (sources named beside the data there) as version 1,
// "Starter tables", published. Every row is first checked against the same schemas an admin's edit or
// CSV import must pass. Does nothing when the database already holds a version.

export async function up(_: { context: MigrationContext }): Promise<void> {
  const problems = tablesProblems(tablesToRows(STARTER_TABLES));
  if (problems.length > 0) throw new Error(`the starter tables fail their own schemas:\n${problems.join("\n")}`);
  await seedTables(STARTER_TABLES, "Starter tables");
}

export async function down({ context: { sequelize } }: { context: MigrationContext }): Promise<void> {
  // Every later version builds on the starter one; taking the seed back takes the whole history
  // (each version's rows cascade with it).
  await sequelize.query("DELETE FROM table_versions");
}
