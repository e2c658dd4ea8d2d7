import { NextResponse } from "next/server";
import { verifyEmailOf } from "@/lib/auth/accounts";
import { issueSignInTicket } from "@/lib/auth/ticket";
import { env } from "@/lib/env";
import { VerifySchema } from "@/lib/auth/schemas";
import { HttpError, parseJson, route } from "@/lib/http";

export const runtime = "nodejs";

// POST /api/auth/verify — confirm an e-mail address with the mailed single-use link, no sign-in
export const POST = route(async (req) => {
  const { token } = await parseJson(req, VerifySchema);
  const userId = await verifyEmailOf(token);
  if (!userId) {
    throw new HttpError(400, "this link has expired or was already used; sign in to have a new one sent", {
      issues: [{ path: "token", message: "expired or already used" }],
    });
  }
  // a short-lived ticket signs this browser in without typing the password again (lib/auth/ticket.ts)
  return NextResponse.json({ ok: true, ticket: issueSignInTicket(userId, "verified", env().NEXTAUTH_SECRET) });
});
