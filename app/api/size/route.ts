import { databaseUnavailableResponse, isDatabaseUnavailable } from "@/lib/db/unavailable";
import { invalidInput, readJsonBody } from "@/lib/http";
import { DesignInputError, largestSpan, sizeMember } from "@/lib/solver/design";
import { getCurrentTables } from "@/lib/tables/current";

export const runtime = "nodejs";

// POST /api/size — rank the members that pass with the current published tables (?find=span: largest span of one member), no sign-in
export async function POST(req: Request): Promise<Response> {
  const read = await readJsonBody(req);
  if (!read.ok) return read.response;
  const { body } = read;
  const find = new URL(req.url).searchParams.get("find");
  if (find !== null && find !== "members" && find !== "span") {
    return invalidInput([{ path: "find", message: 'must be "members" or "span"' }]);
  }
  try {
    const tables = await getCurrentTables();
    return Response.json(find === "span" ? largestSpan(body, tables) : sizeMember(body, tables));
  } catch (err) {
    if (err instanceof DesignInputError) return invalidInput(err.issues);
    if (isDatabaseUnavailable(err)) return databaseUnavailableResponse();
    throw err;
  }
}
