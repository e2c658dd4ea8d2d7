/** The Stripe stand-in: customers (/v1/customers). */
import { noSuch } from "./errors";
import { type FormObject, metadata, str } from "./form";
import { mergeMetadata } from "./helpers";
import { type CustomerObject, newId } from "./objects";
import { clone, type StandinStore } from "./store";

export function createCustomer(store: StandinStore, p: FormObject): CustomerObject {
  const customer: CustomerObject = {
    id: newId("cus"),
    object: "customer",
    address: null,
    balance: 0,
    created: store.now(),
    currency: null,
    default_source: null,
    delinquent: false,
    description: str(p, "description") ?? null,
    email: str(p, "email") ?? null,
    invoice_prefix: newId("x").slice(2, 10).toUpperCase(),
    invoice_settings: { custom_fields: null, default_payment_method: null, footer: null, rendering_options: null },
    livemode: false,
    metadata: metadata(p) ?? {},
    name: str(p, "name") ?? null,
    phone: str(p, "phone") ?? null,
    preferred_locales: [],
    shipping: null,
    tax_exempt: "none",
    test_clock: null,
  };
  store.customers.set(customer.id, customer);
  store.emit("customer.created", customer);
  return clone(customer);
}

export function retrieveCustomer(store: StandinStore, id: string): CustomerObject {
  const customer = store.customers.get(id);
  if (!customer) throw noSuch("customer", id);
  return clone(customer);
}

export function updateCustomer(store: StandinStore, id: string, p: FormObject): CustomerObject {
  const customer = store.customers.get(id);
  if (!customer) throw noSuch("customer", id);
  const previous: Record<string, unknown> = {};
  for (const key of ["email", "name", "description", "phone"] as const) {
    const v = str(p, key);
    if (v !== undefined) {
      previous[key] = customer[key];
      customer[key] = v === "" ? null : v;
    }
  }
  const meta = metadata(p);
  if (meta) {
    previous.metadata = { ...customer.metadata };
    customer.metadata = mergeMetadata(customer.metadata, meta);
  }
  store.emit("customer.updated", customer, previous);
  return clone(customer);
}
