import { randomBytes } from "node:crypto";

/**
 * The Stripe objects the stand-in keeps, in Stripe's own JSON shapes (API version of the installed SDK:
 * current period on subscription items, an invoice's subscription under parent.subscription_details).
 * Only the fields the app and the SDK's types rely on are filled; the rest carry Stripe's defaults.
 */
export type Metadata = Record<string, string>;

export interface ProductObject {
  id: string;
  object: "product";
  active: boolean;
  created: number;
  updated: number;
  default_price: string | null;
  description: string | null;
  images: string[];
  livemode: false;
  marketing_features: Array<{ name: string }>;
  metadata: Metadata;
  name: string;
  package_dimensions: null;
  shippable: null;
  statement_descriptor: string | null;
  tax_code: null;
  type: "service";
  unit_label: string | null;
  url: string | null;
}

export type Interval = "day" | "week" | "month" | "year";

export interface PriceObject {
  id: string;
  object: "price";
  active: boolean;
  billing_scheme: "per_unit";
  created: number;
  currency: string;
  custom_unit_amount: null;
  livemode: false;
  lookup_key: string | null;
  metadata: Metadata;
  nickname: string | null;
  product: string;
  recurring: { interval: Interval; interval_count: number; meter: null; trial_period_days: null; usage_type: "licensed" } | null;
  tax_behavior: "unspecified";
  tiers_mode: null;
  transform_quantity: null;
  type: "one_time" | "recurring";
  unit_amount: number;
  unit_amount_decimal: string;
}

export interface CustomerObject {
  id: string;
  object: "customer";
  address: null;
  balance: number;
  created: number;
  currency: string | null;
  default_source: null;
  delinquent: boolean;
  description: string | null;
  email: string | null;
  invoice_prefix: string;
  invoice_settings: { custom_fields: null; default_payment_method: string | null; footer: null; rendering_options: null };
  livemode: false;
  metadata: Metadata;
  name: string | null;
  phone: string | null;
  preferred_locales: string[];
  shipping: null;
  tax_exempt: "none";
  test_clock: null;
}

export interface CheckoutSessionObject {
  id: string;
  object: "checkout.session";
  amount_subtotal: number;
  amount_total: number;
  cancel_url: string | null;
  client_reference_id: string | null;
  created: number;
  currency: string;
  customer: string | null;
  customer_email: string | null;
  expires_at: number;
  invoice: string | null;
  livemode: false;
  metadata: Metadata;
  mode: "subscription";
  payment_method_types: string[];
  payment_status: "paid" | "unpaid";
  status: "open" | "complete" | "expired";
  subscription: string | null;
  success_url: string;
  ui_mode: "hosted";
  url: string | null;
}

/** What the stand-in remembers about a session beyond its public shape. */
export interface CheckoutSessionPrivate {
  lineItems: Array<{ price: string; quantity: number }>;
  subscriptionMetadata: Metadata;
  declines: number;
}

interface SubscriptionItemObject {
  id: string;
  object: "subscription_item";
  created: number;
  current_period_end: number;
  current_period_start: number;
  metadata: Metadata;
  price: PriceObject;
  quantity: number;
  subscription: string;
}

export type SubscriptionStatus = "incomplete" | "incomplete_expired" | "trialing" | "active" | "past_due" | "canceled" | "unpaid" | "paused";

export interface SubscriptionObject {
  id: string;
  object: "subscription";
  billing_cycle_anchor: number;
  cancel_at: number | null;
  cancel_at_period_end: boolean;
  canceled_at: number | null;
  cancellation_details: { comment: string | null; feedback: string | null; reason: string | null };
  collection_method: "charge_automatically";
  created: number;
  currency: string;
  customer: string;
  default_payment_method: string | null;
  description: null;
  ended_at: number | null;
  items: { object: "list"; data: SubscriptionItemObject[]; has_more: false; url: string };
  latest_invoice: string | null;
  livemode: false;
  metadata: Metadata;
  start_date: number;
  status: SubscriptionStatus;
  trial_end: null;
  trial_start: null;
}

export interface InvoiceObject {
  id: string;
  object: "invoice";
  amount_due: number;
  amount_paid: number;
  amount_remaining: number;
  attempt_count: number;
  attempted: boolean;
  billing_reason: "subscription_create" | "subscription_cycle";
  collection_method: "charge_automatically";
  created: number;
  currency: string;
  customer: string;
  customer_email: string | null;
  customer_name: string | null;
  hosted_invoice_url: null;
  lines: {
    object: "list";
    data: Array<{
      id: string;
      object: "line_item";
      amount: number;
      currency: string;
      description: string;
      metadata: Metadata;
      period: { start: number; end: number };
      pricing: { price_details: { price: string; product: string }; type: "price_details"; unit_amount_decimal: string };
      quantity: number;
    }>;
    has_more: false;
    url: string;
  };
  livemode: false;
  metadata: Metadata;
  number: string;
  parent: { quote_details: null; subscription_details: { metadata: Metadata; subscription: string }; type: "subscription_details" };
  period_end: number;
  period_start: number;
  status: "draft" | "open" | "paid" | "uncollectible" | "void";
  status_transitions: { finalized_at: number | null; marked_uncollectible_at: null; paid_at: number | null; voided_at: null };
  subtotal: number;
  total: number;
}

export interface PortalSessionObject {
  id: string;
  object: "billing_portal.session";
  configuration: string;
  created: number;
  customer: string;
  flow: null;
  livemode: false;
  locale: null;
  on_behalf_of: null;
  return_url: string | null;
  url: string;
}

export interface EventObject {
  id: string;
  object: "event";
  api_version: string;
  created: number;
  data: { object: StandinObject; previous_attributes?: Record<string, unknown> };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: string;
}

export type StandinObject =
  ProductObject | PriceObject | CustomerObject | CheckoutSessionObject | SubscriptionObject | InvoiceObject | PortalSessionObject | EventObject;

const ALPHABET = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz";

/** An id like Stripe's: a prefix and 24 random characters (`cus_9s6XKzkNRiz8i3`). */
export function newId(prefix: string): string {
  const bytes = randomBytes(24);
  let out = "";
  for (const b of bytes) out += ALPHABET[b % ALPHABET.length];
  return `${prefix}_${out}`;
}

/** Adds whole months or years in UTC, clamping the day as Stripe does (31 Jan + 1 month = 28/29 Feb). */
export function addInterval(epochSec: number, interval: Interval, count: number): number {
  const d = new Date(epochSec * 1000);
  if (interval === "day") return epochSec + 86_400 * count;
  if (interval === "week") return epochSec + 7 * 86_400 * count;
  const months = interval === "year" ? 12 * count : count;
  const day = d.getUTCDate();
  const target = new Date(Date.UTC(d.getUTCFullYear(), d.getUTCMonth() + months, 1, d.getUTCHours(), d.getUTCMinutes(), d.getUTCSeconds()));
  const lastDay = new Date(Date.UTC(target.getUTCFullYear(), target.getUTCMonth() + 1, 0)).getUTCDate();
  target.setUTCDate(Math.min(day, lastDay));
  return Math.floor(target.getTime() / 1000);
}
