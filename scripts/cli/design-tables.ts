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
  const { getCurrentTables } = await import("../../lib/tables/current");
  return getCurrentTables();
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
