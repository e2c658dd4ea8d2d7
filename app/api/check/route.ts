import { databaseUnavailableResponse, isDatabaseUnavailable } from "@/lib/db/unavailable";
import { invalidInput, readJsonBody } from "@/lib/http";
import { checkMember, DesignInputError } from "@/lib/solver/design";
import { getCurrentTables } from "@/lib/tables/current";

export const runtime = "nodejs";

// POST /api/check — check one member against its loads with the current published tables, no sign-in
export async function POST(req: Request): Promise<Response> {
  const read = await readJsonBody(req);
  if (!read.ok) return read.response;
  const { body } = read;
  try {
    return Response.json(checkMember(body, await getCurrentTables()));
  } catch (err) {
    if (err instanceof DesignInputError) return invalidInput(err.issues);
    if (isDatabaseUnavailable(err)) return databaseUnavailableResponse();
    throw err;
  }
}
