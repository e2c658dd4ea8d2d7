// POST /api/solve — analyse one beam, no sign-in
import { invalidInput, readJsonBody } from "@/lib/http";
import { BeamInputError, BeamInstabilityError, solve } from "@/lib/solver/beam";
import { beamInputSchema, issuesOf } from "@/lib/solver/schema";

export const runtime = "nodejs";

// Bad input: 400 { error: "invalid input", issues: [{ path, message }] }.
// A layout that cannot carry load: 422 { error: "unstable", message } (the input is well formed).
export async function POST(req: Request): Promise<Response> {
  const read = await readJsonBody(req);
  if (!read.ok) return read.response;
  const { body } = read;
  const parsed = beamInputSchema.safeParse(body);
  if (!parsed.success) {
    return invalidInput(issuesOf(parsed.error));
  }
  try {
    return Response.json(solve(parsed.data));
  } catch (err) {
    if (err instanceof BeamInstabilityError) return Response.json({ error: "unstable", message: err.message }, { status: 422 });
    if (err instanceof BeamInputError) return invalidInput(err.issues);
    throw err;
  }
}
