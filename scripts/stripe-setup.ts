// Creates Spanlark's product and its monthly and yearly prices through the Stripe SDK, found again by
// lookup key so it can run on every start: `npx tsx scripts/stripe-setup.ts`. Talks to the stand-in when
// STRIPE_API_HOST/PORT/PROTOCOL are set, otherwise to Stripe with STRIPE_SECRET_KEY.
import { z } from "zod";
import { ensureCatalog } from "@/lib/payments/catalog";
import { connectionFromEnv, createStripeClient } from "@/lib/payments/client";

const Config = z.object({
  STRIPE_SECRET_KEY: z.string().min(1).default("sk_test_local"),
  STRIPE_API_HOST: z.string().optional(),
  STRIPE_API_PORT: z.coerce.number().int().positive().optional(),
  STRIPE_API_PROTOCOL: z.enum(["http", "https"]).optional(),
});

const parsed = Config.safeParse(process.env);
if (!parsed.success) {
  for (const issue of parsed.error.issues) console.error(`[stripe-setup] ${issue.path.join(".")}: ${issue.message}`);
  process.exit(2);
}

const stripe = createStripeClient(connectionFromEnv(parsed.data));
const where = parsed.data.STRIPE_API_HOST
  ? `${parsed.data.STRIPE_API_PROTOCOL ?? "https"}://${parsed.data.STRIPE_API_HOST}:${parsed.data.STRIPE_API_PORT ?? ""}`
  : "Stripe";
const deadline = Date.now() + 15_000;
for (;;) {
  try {
    const catalog = await ensureCatalog(stripe);
    console.log(
      `[stripe-setup] ${where}: product ${catalog.productId}; monthly ${catalog.prices.monthly.id}; yearly ${catalog.prices.yearly.id}; ` +
        (catalog.created.length ? `created ${catalog.created.join(", ")}` : "nothing new"),
    );
    break;
  } catch (err) {
    const connection = (err as { type?: string }).type === "StripeConnectionError";
    if (!connection || Date.now() > deadline) {
      console.error(`[stripe-setup] failed against ${where}: ${(err as Error).message}`);
      process.exit(1);
    }
    await new Promise((r) => setTimeout(r, 500));
  }
}
