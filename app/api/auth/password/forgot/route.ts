import { NextResponse } from "next/server";
import { requestPasswordReset } from "@/lib/auth/accounts";
import { clientIp } from "@/lib/auth/client-ip";
import { EmailOnlySchema } from "@/lib/auth/schemas";
import { parseJson, route } from "@/lib/http";

export const runtime = "nodejs";

// The one answer to every accepted request, whether or not the address has an account.
const FORGOT_ANSWER = "Check your e-mail: if the address has an account, a link to choose a new password is on its way. It works for one hour.";

// POST /api/auth/password/forgot — mail a single-use link to choose a new password, no sign-in (same answer for any address)
export const POST = route(async (req) => {
  const { email } = await parseJson(req, EmailOnlySchema);
  await requestPasswordReset(email, clientIp(req.headers));
  return NextResponse.json({ ok: true, message: FORGOT_ANSWER }, { status: 202 });
});
