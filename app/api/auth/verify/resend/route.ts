import { NextResponse } from "next/server";
import { resendVerification } from "@/lib/auth/accounts";
import { clientIp } from "@/lib/auth/client-ip";
import { ResendVerificationSchema } from "@/lib/auth/schemas";
import { parseJson, route } from "@/lib/http";

export const runtime = "nodejs";

// POST /api/auth/verify/resend — mail a new confirmation link to an unconfirmed account, no sign-in (same answer for any address)
export const POST = route(async (req) => {
  const { email, returnTo } = await parseJson(req, ResendVerificationSchema);
  await resendVerification(email, clientIp(req.headers), returnTo);
  return NextResponse.json({ ok: true, message: "If that address has an unconfirmed account, a new link is on its way." }, { status: 202 });
});
