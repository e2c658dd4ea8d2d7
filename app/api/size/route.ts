import { DesignInputError, largestSpan, sizeMember } from "@/lib/solver/design";
import { getCurrentTables } from "@/lib/tables/current";

export const runtime = "nodejs";

// POST /api/size — rank the members that pass with the current published tables (?find=span: largest span of one member), no sign-in
export async function POST(req: Request): Promise<Response> {
  let body: unknown;
  try {
    body = JSON.parse(await req.text());
  } catch {
    return Response.json({ error: "invalid input", issues: [{ path: "", message: "the body is not valid JSON" }] }, { status: 400 });
  }
  const find = new URL(req.url).searchParams.get("find");
  if (find !== null && find !== "members" && find !== "span") {
    return Response.json({ error: "invalid input", issues: [{ path: "find", message: 'must be "members" or "span"' }] }, { status: 400 });
  }
  try {
    const tables = await getCurrentTables();
    return Response.json(find === "span" ? largestSpan(body, tables) : sizeMember(body, tables));
  } catch (err) {
    if (err instanceof DesignInputError) return Response.json({ error: "invalid input", issues: err.issues }, { status: 400 });
    throw err;
  }
}
