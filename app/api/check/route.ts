import { checkMember, DesignInputError } from "@/lib/solver/design";
import { getCurrentTables } from "@/lib/tables/current";

export const runtime = "nodejs";

// POST /api/check — check one member against its loads with the current published tables, no sign-in
export async function POST(req: Request): Promise<Response> {
  let body: unknown;
  try {
    body = JSON.parse(await req.text());
  } catch {
    return Response.json({ error: "invalid input", issues: [{ path: "", message: "the body is not valid JSON" }] }, { status: 400 });
  }
  try {
    return Response.json(checkMember(body, await getCurrentTables()));
  } catch (err) {
    if (err instanceof DesignInputError) return Response.json({ error: "invalid input", issues: err.issues }, { status: 400 });
    throw err;
  }
}
