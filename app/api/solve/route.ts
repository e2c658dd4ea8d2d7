import { invalidInput, readJsonBody, route } from "@/lib/http";
import { BeamInputError, BeamInstabilityError, solve } from "@/lib/solver/beam";
import { beamInputSchema } from "@/lib/solver/schema";
import { zodIssues } from "@/lib/zod-issues";

export const runtime = "nodejs";

// POST /api/solve — analyze one beam, no sign-in
// Bad input: 400 { error: "invalid input", issues: [{ path, message }] }.
// A layout that cannot carry load: 422 { error: "unstable", message } (the input is well formed).
export const POST = route(async (req) => {
  const read = await readJsonBody(req);
  if (!read.ok) return read.response;
  const parsed = beamInputSchema.safeParse(read.body);
  if (!parsed.success) return invalidInput(zodIssues(parsed.error));
  try {
    return Response.json(solve(parsed.data));
  } catch (err) {
    if (err instanceof BeamInstabilityError) return Response.json({ error: "unstable", message: err.message }, { status: 422 });
    if (err instanceof BeamInputError) return invalidInput(err.issues);
    throw err;
  }
});
