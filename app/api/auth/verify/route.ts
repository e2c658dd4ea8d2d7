import { NextResponse } from "next/server";
import { verifyEmail } from "@/lib/auth/accounts";
import { VerifySchema } from "@/lib/auth/schemas";
import { HttpError, parseJson, route } from "@/lib/http";

export const runtime = "nodejs";

// POST /api/auth/verify — confirm an e-mail address with the mailed single-use link, no sign-in
export const POST = route(async (req) => {
  const { token } = await parseJson(req, VerifySchema);
  if (!(await verifyEmail(token))) {
    throw new HttpError(400, "this link has expired or was already used; sign in to have a new one sent", {
      issues: [{ path: "token", message: "expired or already used" }],
    });
  }
  return NextResponse.json({ ok: true });
});
