import Stripe from "stripe";

export interface StripeConnection {
  secretKey: string;
  host?: string;
  port?: number;
  protocol?: "http" | "https";
}

/**
 * A Stripe client. With a host (and port, protocol) it talks to that server — the local stand-in in
 * development and tests; with only a key it talks to Stripe. The code that uses it is the same either way.
 * (No "server-only" here: scripts/stripe-setup.ts runs it outside Next.js.)
 */
export function createStripeClient({ secretKey, host, port, protocol }: StripeConnection): Stripe {
  return new Stripe(secretKey, {
    ...(host ? { host, port: port ?? (protocol === "http" ? 80 : 443), protocol: protocol ?? "https" } : {}),
    maxNetworkRetries: host ? 0 : 2,
    timeout: 20_000,
    appInfo: { name: "Spanlark" },
  });
}

/** The connection described by the environment (STRIPE_SECRET_KEY, STRIPE_API_HOST/PORT/PROTOCOL). */
export function connectionFromEnv(e: {
  STRIPE_SECRET_KEY: string;
  STRIPE_API_HOST?: string;
  STRIPE_API_PORT?: number;
  STRIPE_API_PROTOCOL?: "http" | "https";
}): StripeConnection {
  return { secretKey: e.STRIPE_SECRET_KEY, host: e.STRIPE_API_HOST, port: e.STRIPE_API_PORT, protocol: e.STRIPE_API_PROTOCOL };
}

export type { Stripe };
