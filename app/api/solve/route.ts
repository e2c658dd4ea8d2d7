// POST /api/solve — analyse one beam, no sign-in
import { BeamInputError, BeamInstabilityError, solve } from "@/lib/solver/beam";
import { beamInputSchema, issuesOf } from "@/lib/solver/schema";

export const runtime = "nodejs";

// Bad input: 400 { error: "invalid input", issues: [{ path, message }] }.
// A layout that cannot carry load: 422 { error: "unstable", message } (the input is well formed).
export async function POST(req: Request): Promise<Response> {
  let body: unknown;
  try {
    body = JSON.parse(await req.text());
  } catch {
    return Response.json({ error: "invalid input", issues: [{ path: "", message: "the body is not valid JSON" }] }, { status: 400 });
  }
  const parsed = beamInputSchema.safeParse(body);
  if (!parsed.success) {
    return Response.json({ error: "invalid input", issues: issuesOf(parsed.error) }, { status: 400 });
  }
  try {
    return Response.json(solve(parsed.data));
  } catch (err) {
    if (err instanceof BeamInstabilityError) return Response.json({ error: "unstable", message: err.message }, { status: 422 });
    if (err instanceof BeamInputError) return Response.json({ error: "invalid input", issues: err.issues }, { status: 400 });
    throw err;
  }
}
