import { databaseUnavailableResponse, isDatabaseUnavailable } from "@/lib/db/unavailable";
import { invalidInput, readJsonBody, route } from "@/lib/http";
import { checkMember, DesignInputError } from "@/lib/solver/design";
import { getCurrentTables } from "@/lib/tables/current";

export const runtime = "nodejs";

// POST /api/check — check one member against its loads with the current published tables, no sign-in
export const POST = route(async (req) => {
  const read = await readJsonBody(req);
  if (!read.ok) return read.response;
  try {
    return Response.json(checkMember(read.body, await getCurrentTables()));
  } catch (err) {
    if (err instanceof DesignInputError) return invalidInput(err.issues);
    if (isDatabaseUnavailable(err)) return databaseUnavailableResponse();
    throw err;
  }
});
