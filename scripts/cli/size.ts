// `npm run --silent size -- FILE [--db] [--span]`: the members that pass, ranked (issue 4);
// with --span the input names one member and the answer is the largest span it passes.
import { largestSpan, sizeMember, type SizeOutput, type SpanOutput } from "../../lib/solver/design";
import { tablesFor, withInputErrors } from "./design-tables";

export async function run(json: unknown, flags: string[]): Promise<SizeOutput | SpanOutput> {
  const tables = await tablesFor("size", flags);
  return withInputErrors(() => (flags.includes("--span") ? largestSpan(json, tables) : sizeMember(json, tables)));
}
