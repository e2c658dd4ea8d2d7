import { NextResponse } from "next/server";
import { resetPassword } from "@/lib/auth/accounts";
import { ResetPasswordSchema } from "@/lib/auth/schemas";
import { HttpError, parseJson, route } from "@/lib/http";

export const runtime = "nodejs";

// POST /api/auth/password/reset — set a new password with the mailed single-use link, no sign-in
export const POST = route(async (req) => {
  const { token, password } = await parseJson(req, ResetPasswordSchema);
  if (!(await resetPassword(token, password))) {
    throw new HttpError(400, "this link has expired or was already used; ask for a new one", {
      issues: [{ path: "token", message: "expired or already used" }],
    });
  }
  return NextResponse.json({ ok: true });
});
