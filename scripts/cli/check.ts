// `npm run --silent check -- FILE [--db]`: one member and its loads as JSON in, the design checks as JSON out (issue 4).
import { checkMember, type CheckOutput } from "../../lib/solver/design";
import { tablesFor, withInputErrors } from "./design-tables";

export async function run(json: unknown, flags: string[]): Promise<CheckOutput> {
  if (flags.includes("--span")) throw new (await import("./errors")).CliInputError("unknown option --span (check takes --db)");
  const tables = await tablesFor("check", flags);
  return withInputErrors(() => checkMember(json, tables));
}
