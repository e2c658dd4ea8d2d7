/** The Stripe stand-in's state. */
import { invalidParam, noSuch } from "./errors";
import { type FormObject, int, str } from "./form";
import {
  type CheckoutSessionObject,
  type CheckoutSessionPrivate,
  type CustomerObject,
  type EventObject,
  type InvoiceObject,
  newId,
  type PortalSessionObject,
  type PriceObject,
  type ProductObject,
  type StandinObject,
  type SubscriptionObject,
} from "./objects";

export interface ListResult<T> {
  object: "list";
  data: T[];
  has_more: boolean;
  url: string;
}

export interface StandinSnapshot {
  products: ProductObject[];
  prices: PriceObject[];
  customers: CustomerObject[];
  sessions: Array<{ session: CheckoutSessionObject; extra: CheckoutSessionPrivate }>;
  subscriptions: SubscriptionObject[];
  invoices: InvoiceObject[];
  portalSessions: PortalSessionObject[];
  events: EventObject[];
  clockOffsetSec: number;
}

interface StandinOptions {
  /** Base URL of the stand-in's own pages (checkout, portal), e.g. http://127.0.0.1:12111. */
  publicUrl: string;
  /** Receives each event as it is created, in order. */
  onEvent?: (event: EventObject) => void;
}

export const clone = <T>(value: T): T => structuredClone(value);

/**
 * The state and the rules of the part of Stripe that Spanlark uses. Every method takes parameters as
 * parsed from Stripe's form encoding and returns Stripe-shaped objects, or throws a StandinApiError.
 */

/**
 * The stand-in's state: every object by id, the events in order and the test clock, with what every
 * resource shares (the clock, events, list paging, lookup for `expand[]`). The resources are functions
 * over it, one module each: catalog, customers, checkout, subscriptions, portal, events, clock.
 */
export class StandinStore {
  products = new Map<string, ProductObject>();
  prices = new Map<string, PriceObject>();
  customers = new Map<string, CustomerObject>();
  sessions = new Map<string, { session: CheckoutSessionObject; extra: CheckoutSessionPrivate }>();
  subscriptions = new Map<string, SubscriptionObject>();
  invoices = new Map<string, InvoiceObject>();
  portalSessions = new Map<string, PortalSessionObject>();
  events: EventObject[] = [];
  clockOffsetSec = 0;
  invoiceCounter = 0;
  apiVersion = "2026-10-28.endive";

  constructor(private readonly options: StandinOptions) {}

  /** The stand-in's clock in Unix seconds: real time, moved forward by /_control/advance. */
  now(): number {
    return Math.floor(Date.now() / 1000) + this.clockOffsetSec;
  }

  get publicUrl(): string {
    return this.options.publicUrl;
  }

  snapshot(): StandinSnapshot {
    return clone({
      products: [...this.products.values()],
      prices: [...this.prices.values()],
      customers: [...this.customers.values()],
      sessions: [...this.sessions.values()],
      subscriptions: [...this.subscriptions.values()],
      invoices: [...this.invoices.values()],
      portalSessions: [...this.portalSessions.values()],
      events: this.events,
      clockOffsetSec: this.clockOffsetSec,
    });
  }

  restore(s: StandinSnapshot): void {
    this.reset();
    for (const p of s.products) this.products.set(p.id, p);
    for (const p of s.prices) this.prices.set(p.id, p);
    for (const c of s.customers) this.customers.set(c.id, c);
    for (const x of s.sessions) this.sessions.set(x.session.id, x);
    for (const x of s.subscriptions) this.subscriptions.set(x.id, x);
    for (const x of s.invoices) this.invoices.set(x.id, x);
    for (const x of s.portalSessions) this.portalSessions.set(x.id, x);
    this.events = s.events;
    this.clockOffsetSec = s.clockOffsetSec;
    this.invoiceCounter = s.invoices.length;
  }

  reset(): void {
    this.products.clear();
    this.prices.clear();
    this.customers.clear();
    this.sessions.clear();
    this.subscriptions.clear();
    this.invoices.clear();
    this.portalSessions.clear();
    this.events = [];
    this.clockOffsetSec = 0;
    this.invoiceCounter = 0;
  }

  emit(type: string, object: StandinObject, previous?: Record<string, unknown>): EventObject {
    const event: EventObject = {
      id: newId("evt"),
      object: "event",
      api_version: this.apiVersion,
      created: this.now(),
      data: previous ? { object: clone(object), previous_attributes: clone(previous) } : { object: clone(object) },
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      type,
    };
    this.events.push(event);
    this.options.onEvent?.(clone(event));
    return event;
  }

  /** Stripe's cursor pagination: `limit` (1–100, default 10), `starting_after`, `ending_before`. */
  page<T extends { id: string }>(items: T[], p: FormObject, url: string): ListResult<T> {
    const limit = int(p, "limit") ?? 10;
    if (limit < 1 || limit > 100) throw invalidParam("limit", "Invalid integer: limit must be between 1 and 100");
    const after = str(p, "starting_after");
    const before = str(p, "ending_before");
    let start = 0;
    let end = items.length;
    if (after) {
      const i = items.findIndex((x) => x.id === after);
      if (i === -1) throw noSuch("object", after, "starting_after");
      start = i + 1;
    } else if (before) {
      const i = items.findIndex((x) => x.id === before);
      if (i === -1) throw noSuch("object", before, "ending_before");
      end = i;
      start = Math.max(0, end - limit);
    }
    const data = items.slice(start, Math.min(end, start + limit));
    return { object: "list", data: clone(data), has_more: start + data.length < end, url };
  }

  /** Looks an id up in any collection, for `expand[]`. */
  find(id: string): StandinObject | undefined {
    const found =
      this.products.get(id) ??
      this.prices.get(id) ??
      this.customers.get(id) ??
      this.sessions.get(id)?.session ??
      this.subscriptions.get(id) ??
      this.invoices.get(id) ??
      this.portalSessions.get(id);
    return found ? clone(found) : undefined;
  }
}
