import { NextResponse } from "next/server";
import { signUp } from "@/lib/auth/accounts";
import { clientIp } from "@/lib/auth/client-ip";
import { SignUpSchema } from "@/lib/auth/schemas";
import { parseJson, route } from "@/lib/http";

export const runtime = "nodejs";

// The one answer to every accepted sign-up, whether or not the address already had an account.
const SIGN_UP_ANSWER = "Check your e-mail: we sent a message there to finish opening your account.";

// POST /api/auth/sign-up — open a builder account and mail a confirmation link, no sign-in
export const POST = route(async (req) => {
  const input = await parseJson(req, SignUpSchema);
  await signUp(input, clientIp(req.headers));
  return NextResponse.json({ ok: true, message: SIGN_UP_ANSWER }, { status: 202 });
});
