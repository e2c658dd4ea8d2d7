import { z } from "zod";
import { parseTrustedProxies } from "@/lib/auth/client-ip";

/**
 * Configuration, read once from the environment and validated. A missing or malformed variable stops
 * start-up with a message naming it (see instrumentation.ts). Every variable is documented in .env.example.
 */
const EnvSchema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  DATABASE_URL: z.string().url("must be a postgres:// URL"),
  APP_URL: z.string().url("must be the public base URL, e.g. http://127.0.0.1:3000").default("http://127.0.0.1:3000"),
  NEXTAUTH_SECRET: z.string().min(16, "must be at least 16 characters"),
  LOG_LEVEL: z.enum(["fatal", "error", "warn", "info", "debug", "trace", "silent"]).default("info"),
  SMTP_HOST: z.string().min(1).default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().positive().default(1025),
  SMTP_SECURE: z
    .enum(["true", "false"])
    .default("false")
    .transform((v) => v === "true"),
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  MAIL_FROM: z.string().min(3).default("Spanlark <no-reply@spanlark.test>"),
  STRIPE_SECRET_KEY: z.string().min(1).default("sk_test_local"),
  STRIPE_WEBHOOK_SECRET: z.string().min(1).default("whsec_local"),
  STRIPE_API_HOST: z.string().optional(),
  STRIPE_API_PORT: z.coerce.number().int().positive().optional(),
  STRIPE_API_PROTOCOL: z.enum(["http", "https"]).optional(),
  STRIPE_STANDIN_PORT: z.coerce.number().int().min(1).max(65535).default(12111),
  /** proxies whose X-Forwarded-For is believed (lib/auth/client-ip.ts); unset: none, the socket's address is used */
  TRUSTED_PROXIES: z
    .string()
    .default("")
    .refine((v) => {
      try {
        parseTrustedProxies(v);
        return true;
      } catch {
        return false;
      }
    }, "must be IP addresses or CIDR ranges separated by commas, e.g. 10.0.0.0/8,127.0.0.1"),
  STRIPE_WEBHOOK_URL: z.union([z.literal(""), z.string().url("must be the app's webhook URL")]).default("http://127.0.0.1:3000/api/stripe/webhook"),
});

export type Env = z.infer<typeof EnvSchema>;

let cached: Env | undefined;

export class EnvError extends Error {}

/** The validated configuration; throws EnvError naming each bad variable. */
export function env(): Env {
  if (cached) return cached;
  const parsed = EnvSchema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
    throw new EnvError(`Spanlark cannot start: bad configuration\n${lines.join("\n")}\n(see .env.example)`);
  }
  cached = parsed.data;
  return cached;
}
