import { NextResponse } from "next/server";
import { BODY_LIMITS, readBodyText, route } from "@/lib/http";
import { handleStripeEvent, verifyStripeEvent } from "@/lib/payments/webhooks";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

// POST /api/stripe/webhook — Stripe's events; no session: the signature on the raw body is the check
export const POST = route(async (req) => {
  const raw = await readBodyText(req, BODY_LIMITS.json);
  const event = verifyStripeEvent(raw, req.headers.get("stripe-signature"));
  const { duplicate, outcome } = await handleStripeEvent(event);
  return NextResponse.json({ received: true, duplicate, outcome });
});
