import { requireUser } from "@/lib/auth/session";
import { HttpError, parseJson, route } from "@/lib/http";
import { assertOwnsMember, editMemberOnce } from "@/lib/jobs/edit-once";
import { editMemberSchema } from "@/lib/jobs/schemas";

export const runtime = "nodejs";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

type Ctx = { params: Promise<{ memberId: string }> };

// PATCH /api/members/[memberId] — a change to a saved member made on a phone with no signal, applied once per
// Idempotency-Key and only if the member is still the version the phone changed (409 with the member as it is now
// otherwise), owner of the member's job
export const PATCH = route<Ctx>(async (req, ctx) => {
  const user = await requireUser();
  const { memberId } = await ctx.params;
  await assertOwnsMember(user.id, memberId);
  const key = req.headers.get("idempotency-key")?.trim() ?? "";
  if (!UUID.test(key)) {
    throw new HttpError(400, "invalid input", { issues: [{ path: "Idempotency-Key", message: "Idempotency-Key: send a UUID that names this change" }] });
  }
  const input = await parseJson(req, editMemberSchema);
  const { response, replayed } = await editMemberOnce(user.id, key.toLowerCase(), memberId.toLowerCase(), input);
  return Response.json(response, { status: 200, headers: { "cache-control": "private, no-store", ...(replayed ? { "idempotent-replayed": "true" } : {}) } });
});
