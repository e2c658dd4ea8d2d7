// Which material tables the design commands read: the starter data in lib/tables by default,
// the database's current published version with --db.
import { STARTER_TABLES } from "../../lib/tables";
import type { MaterialTables } from "../../lib/tables/types";
import { DesignInputError } from "../../lib/solver/design";
import { CliInputError } from "./errors";

export async function tablesFor(command: string, flags: string[]): Promise<MaterialTables> {
  const unknown = flags.filter((f) => f !== "--db" && f !== "--span");
  if (unknown.length) throw new CliInputError(`unknown option ${unknown[0]} (${command} takes --db${command === "size" ? " and --span" : ""})`);
  if (!flags.includes("--db")) return STARTER_TABLES;
  return publishedTables(command);
}

/** The database's current published version (lib/tables/db), read through the app's Sequelize instance. */
async function publishedTables(command: string): Promise<MaterialTables> {
  if (!process.env.DATABASE_URL) {
    throw new CliInputError(
      `--db: DATABASE_URL is not set, so the database's published tables are not available here; run ${command} without --db to use the starter tables`,
    );
  }
  const { getSequelize } = await import("../../lib/db");
  const { currentVersionId, loadVersion } = await import("../../lib/tables/db/queries");
  const sequelize = getSequelize();
  try {
    const id = await currentVersionId();
    const tables = id ? await loadVersion(id) : null;
    if (!tables) throw new CliInputError("--db: the database holds no published tables yet (npm run db:seed loads the starter version)");
    return tables;
  } finally {
    await sequelize.close();
  }
}

/** Runs a design function, turning bad input into exit status 2 with every field named. */
export function withInputErrors<T>(fn: () => T): T {
  try {
    return fn();
  } catch (err) {
    if (err instanceof DesignInputError) throw new CliInputError(err.message);
    throw err;
  }
}
