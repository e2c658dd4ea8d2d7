import type Stripe from "stripe";
import { PLAN_IDS, PLANS, PRODUCT, type PlanId } from "./plans";

export interface Catalog {
  productId: string;
  prices: Record<PlanId, { id: string; lookupKey: string; unitAmount: number }>;
  created: string[];
}

/**
 * Makes sure the product and its monthly and yearly prices exist, found by lookup key, so running it twice
 * creates nothing new. A price whose amount or interval no longer matches plans.ts is replaced by a new
 * price that takes over the lookup key (prices are immutable in Stripe).
 */
export async function ensureCatalog(stripe: Stripe): Promise<Catalog> {
  const created: string[] = [];
  const lookupKeys = PLAN_IDS.map((id) => PLANS[id].lookupKey);
  const existing = await stripe.prices.list({ lookup_keys: lookupKeys, active: true, limit: 10 });

  let productId: string | undefined = existing.data.map((p) => (typeof p.product === "string" ? p.product : p.product.id))[0];
  if (!productId) {
    const products = await stripe.products.list({ active: true, limit: 100 });
    productId = products.data.find((p) => p.metadata[PRODUCT.metadataKey] === PRODUCT.metadataValue)?.id;
  }
  if (!productId) {
    const product = await stripe.products.create({
      name: PRODUCT.name,
      description: PRODUCT.description,
      metadata: { [PRODUCT.metadataKey]: PRODUCT.metadataValue },
    });
    productId = product.id;
    created.push(product.id);
  }

  const prices = {} as Catalog["prices"];
  for (const id of PLAN_IDS) {
    const plan = PLANS[id];
    const match = existing.data.find((p) => p.lookup_key === plan.lookupKey);
    const fits =
      match &&
      match.unit_amount === plan.amountCents &&
      match.currency === plan.currency &&
      match.recurring?.interval === plan.interval &&
      match.recurring.interval_count === 1;
    if (match && fits) {
      prices[id] = { id: match.id, lookupKey: plan.lookupKey, unitAmount: plan.amountCents };
      continue;
    }
    const price = await stripe.prices.create({
      product: productId,
      currency: plan.currency,
      unit_amount: plan.amountCents,
      recurring: { interval: plan.interval },
      lookup_key: plan.lookupKey,
      transfer_lookup_key: true,
      nickname: `${PRODUCT.name} ${plan.name}`,
      metadata: { plan: plan.id },
    });
    prices[id] = { id: price.id, lookupKey: plan.lookupKey, unitAmount: plan.amountCents };
    created.push(price.id);
  }
  return { productId, prices, created };
}
