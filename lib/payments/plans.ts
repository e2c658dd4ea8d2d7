/**
 * Spanlark's paid plan and what the free tier keeps. One product with a monthly and a yearly price, found
 * by lookup key (scripts/stripe-setup.ts creates them; the same keys work on a real Stripe account).
 */
export type PlanId = "monthly" | "yearly";
export const PLAN_IDS: readonly PlanId[] = ["monthly", "yearly"];

export interface Plan {
  id: PlanId;
  name: string;
  lookupKey: string;
  /** In cents. */
  amountCents: number;
  currency: "usd";
  interval: "month" | "year";
}

export const PRODUCT = {
  name: "Spanlark Sheets",
  description: "Saved jobs without a limit, job sheets to save, print and reprint, and more crew links.",
  metadataKey: "spanlark_product",
  metadataValue: "sheets",
} as const;

export const PLANS: Record<PlanId, Plan> = {
  monthly: { id: "monthly", name: "Monthly", lookupKey: "spanlark_sheets_monthly", amountCents: 1200, currency: "usd", interval: "month" },
  yearly: { id: "yearly", name: "Yearly", lookupKey: "spanlark_sheets_yearly", amountCents: 12000, currency: "usd", interval: "year" },
};

export function planByLookupKey(lookupKey: string | null | undefined): Plan | undefined {
  return PLAN_IDS.map((id) => PLANS[id]).find((p) => p.lookupKey === lookupKey);
}

/**
 * What a builder without an active subscription may keep. Saving or reprinting a job sheet needs a
 * subscription; when one lapses, everything already saved stays readable and nothing is deleted.
 */
export const FREE_LIMITS = {
  /** Saved jobs a free account may hold. */
  savedJobs: 3,
  /** Crew links that are live (not revoked, not expired) at one time. */
  activeCrewLinks: 3,
  /** Job sheets a free account may save (sheets are the paid feature). */
  savedSheets: 0,
} as const;

export type FreeLimits = typeof FREE_LIMITS;

export function formatMoney(amountCents: number, currency = "usd"): string {
  return new Intl.NumberFormat("en-US", { style: "currency", currency: currency.toUpperCase() }).format(amountCents / 100);
}
