import { requireUser } from "@/lib/auth/session";
import { HttpError, parseJson, route } from "@/lib/http";
import { saveMemberOnce } from "@/lib/jobs/save-once";
import { saveMemberSchema } from "@/lib/jobs/schemas";
import { getPlanLimits } from "@/lib/payments/subscriptions";

export const runtime = "nodejs";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

// POST /api/members — save a sizing flow's answer to one of the caller's jobs (or a new one), made once per
// Idempotency-Key: the same key again answers as the first time and saves nothing (a phone's queued save), signed-in account
export const POST = route(async (req) => {
  const user = await requireUser();
  const key = req.headers.get("idempotency-key")?.trim() ?? "";
  if (!UUID.test(key)) {
    throw new HttpError(400, "invalid input", { issues: [{ path: "Idempotency-Key", message: "Idempotency-Key: send a UUID that names this save" }] });
  }
  const input = await parseJson(req, saveMemberSchema);
  if (input.saveKey !== undefined && input.saveKey.toLowerCase() !== key.toLowerCase()) {
    throw new HttpError(400, "invalid input", { issues: [{ path: "saveKey", message: "Save key: must match the Idempotency-Key header" }] });
  }
  const limits = await getPlanLimits(user);
  const { response, replayed } = await saveMemberOnce(user.id, key.toLowerCase(), input, limits.savedJobs);
  return Response.json(response, { status: 201, headers: { "cache-control": "private, no-store", ...(replayed ? { "idempotent-replayed": "true" } : {}) } });
});
