import { NextResponse } from "next/server";
import { route } from "@/lib/http";
import { handleStripeEvent, verifyStripeEvent } from "@/lib/payments/webhooks";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

// POST /api/stripe/webhook — Stripe's events; no session: the signature on the raw body is the check
export const POST = route(async (req) => {
  const raw = await req.text();
  const event = verifyStripeEvent(raw, req.headers.get("stripe-signature"));
  const { duplicate, outcome } = await handleStripeEvent(event);
  return NextResponse.json({ received: true, duplicate, outcome });
});
