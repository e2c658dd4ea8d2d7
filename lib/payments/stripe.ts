import "server-only";
import type Stripe from "stripe";
import { env } from "@/lib/env";
import { connectionFromEnv, createStripeClient } from "./client";

const holder = globalThis as unknown as { spanlarkStripe?: Stripe };

/** The process's Stripe client, configured once from the environment. */
export function getStripe(): Stripe {
  holder.spanlarkStripe ??= createStripeClient(connectionFromEnv(env()));
  return holder.spanlarkStripe;
}

/** Replaces the process's client (tests point it at their own stand-in). */
export function setStripeForTests(client: Stripe | undefined): void {
  holder.spanlarkStripe = client;
}
