/** Small rules the stand-in's resources share. */
import { invalidParam, missingParam, StandinApiError } from "./errors";
import { type FormValue, int, str } from "./form";
import { type SubscriptionObject } from "./objects";

export function periodEndOf(sub: SubscriptionObject): number {
  return Math.min(...sub.items.data.map((i) => i.current_period_end));
}

export function mergeMetadata(current: Record<string, string>, update: Record<string, string>): Record<string, string> {
  const out = { ...current };
  for (const [k, v] of Object.entries(update)) {
    if (v === "") delete out[k];
    else out[k] = v;
  }
  return out;
}

export function assertUrl(value: string, param: string): void {
  try {
    const u = new URL(value.replace("{CHECKOUT_SESSION_ID}", "x"));
    if (u.protocol !== "http:" && u.protocol !== "https:") throw new Error("scheme");
  } catch {
    throw invalidParam(param, "Not a valid URL");
  }
}

export function readLineItem(item: FormValue, i: number): { price: string; quantity: number } {
  if (typeof item !== "object" || Array.isArray(item)) throw invalidParam(`line_items[${i}]`, `Invalid hash: line_items[${i}]`);
  const price = str(item, "price");
  if (!price) throw missingParam(`line_items[${i}][price]`);
  const quantity = int(item, "quantity") ?? 1;
  if (quantity < 1) throw invalidParam(`line_items[${i}][quantity]`, "This value must be greater than or equal to 1.");
  return { price, quantity };
}

export function checkExpiry(expiry: string, nowSec: number): void {
  const m = /^\s*(\d{1,2})\s*\/\s*(\d{2}|\d{4})\s*$/.exec(expiry);
  if (!m) throw new StandinApiError(402, "card_error", "Your card's expiration date is incomplete.", "incomplete_expiry", "exp");
  const month = Number(m[1]);
  const year = m[2].length === 2 ? 2000 + Number(m[2]) : Number(m[2]);
  if (month < 1 || month > 12) throw new StandinApiError(402, "card_error", "Your card's expiration month is invalid.", "invalid_expiry_month", "exp_month");
  const now = new Date(nowSec * 1000);
  const expired = year < now.getUTCFullYear() || (year === now.getUTCFullYear() && month < now.getUTCMonth() + 1);
  if (expired) throw new StandinApiError(402, "card_error", "Your card's expiration year is in the past.", "invalid_expiry_year", "exp_year");
}
