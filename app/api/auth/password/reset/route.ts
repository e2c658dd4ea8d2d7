import { NextResponse } from "next/server";
import { resetPasswordOf } from "@/lib/auth/accounts";
import { issueSignInTicket } from "@/lib/auth/ticket";
import { env } from "@/lib/env";
import { ResetPasswordSchema } from "@/lib/auth/schemas";
import { HttpError, parseJson, route } from "@/lib/http";

export const runtime = "nodejs";

// POST /api/auth/password/reset — set a new password with the mailed single-use link, no sign-in
export const POST = route(async (req) => {
  const { token, password } = await parseJson(req, ResetPasswordSchema);
  const userId = await resetPasswordOf(token, password);
  if (!userId) {
    throw new HttpError(400, "this link has expired or was already used; ask for a new one", {
      issues: [{ path: "token", message: "expired or already used" }],
    });
  }
  // a short-lived ticket signs this browser in without typing the password again (lib/auth/ticket.ts)
  return NextResponse.json({ ok: true, ticket: issueSignInTicket(userId, "reset", env().NEXTAUTH_SECRET) });
});
