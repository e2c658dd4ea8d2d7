// The local Stripe stand-in: `npx tsx scripts/stripe-standin.ts`. Speaks the part of Stripe's REST API the
// app uses, serves a test checkout page and portal, and sends signed webhooks to the app.
// Env: STRIPE_STANDIN_PORT (12111), STRIPE_WEBHOOK_URL (http://127.0.0.1:3000/api/stripe/webhook; empty sends
// none), STRIPE_WEBHOOK_SECRET (whsec_local), STRIPE_STANDIN_STATE (a JSON file keeping state across restarts).
import { z } from "zod";
import { startStandinServer } from "./server";

const Config = z.object({
  STRIPE_STANDIN_PORT: z.coerce.number().int().min(1).max(65535).default(12111),
  STRIPE_WEBHOOK_URL: z.union([z.literal(""), z.string().url("must be the app's webhook URL")]).default("http://127.0.0.1:3000/api/stripe/webhook"),
  STRIPE_WEBHOOK_SECRET: z.string().min(1).default("whsec_local"),
  STRIPE_STANDIN_STATE: z.string().optional(),
});

const parsed = Config.safeParse(process.env);
if (!parsed.success) {
  for (const issue of parsed.error.issues) console.error(`[stripe-standin] ${issue.path.join(".")}: ${issue.message}`);
  process.exit(2);
}
const config = parsed.data;

const standin = await startStandinServer({
  port: config.STRIPE_STANDIN_PORT,
  webhookUrl: config.STRIPE_WEBHOOK_URL,
  webhookSecret: config.STRIPE_WEBHOOK_SECRET,
  statePath: config.STRIPE_STANDIN_STATE || undefined,
  log: (line) => console.log(`[stripe-standin] ${line}`),
});
console.log(`[stripe-standin] listening on ${standin.url}, webhooks to ${config.STRIPE_WEBHOOK_URL || "(none)"}`);

for (const signal of ["SIGINT", "SIGTERM"] as const) {
  process.on(signal, () => {
    void standin.close().then(() => process.exit(0));
  });
}
