/** The Stripe stand-in: products and prices (/v1/products, /v1/prices). */
import { invalidParam, missingParam, noSuch } from "./errors";
import { bool, type FormObject, int, metadata, obj, str, stringList } from "./form";
import { type Interval, newId, type PriceObject, type ProductObject } from "./objects";
import { clone, type ListResult, type StandinStore } from "./store";

export function createProduct(store: StandinStore, p: FormObject): ProductObject {
  const name = str(p, "name");
  if (!name) throw missingParam("name");
  const now = store.now();
  const product: ProductObject = {
    id: str(p, "id") ?? newId("prod"),
    object: "product",
    active: bool(p, "active") ?? true,
    created: now,
    updated: now,
    default_price: null,
    description: str(p, "description") ?? null,
    images: [],
    livemode: false,
    marketing_features: [],
    metadata: metadata(p) ?? {},
    name,
    package_dimensions: null,
    shippable: null,
    statement_descriptor: str(p, "statement_descriptor") ?? null,
    tax_code: null,
    type: "service",
    unit_label: str(p, "unit_label") ?? null,
    url: null,
  };
  if (store.products.has(product.id)) throw invalidParam("id", `Product already exists.`);
  store.products.set(product.id, product);
  return clone(product);
}

export function retrieveProduct(store: StandinStore, id: string): ProductObject {
  const product = store.products.get(id);
  if (!product) throw noSuch("product", id);
  return clone(product);
}

export function listProducts(store: StandinStore, p: FormObject): ListResult<ProductObject> {
  const active = bool(p, "active");
  const ids = stringList(p, "ids");
  const items = [...store.products.values()].filter((x) => (active === undefined || x.active === active) && (!ids || ids.includes(x.id)));
  return store.page(items, p, "/v1/products");
}

export function createPrice(store: StandinStore, p: FormObject): PriceObject {
  const currency = str(p, "currency");
  if (!currency) throw missingParam("currency");
  const productId = str(p, "product");
  let product: ProductObject;
  if (productId) {
    product =
      store.products.get(productId) ??
      (() => {
        throw noSuch("product", productId, "product");
      })();
  } else {
    const productData = obj(p, "product_data");
    if (!productData) throw missingParam("product");
    product = createProduct(store, productData);
  }
  const unitAmount = int(p, "unit_amount");
  if (unitAmount === undefined) throw missingParam("unit_amount");
  if (unitAmount < 0) throw invalidParam("unit_amount", "This value must be greater than or equal to 0.");
  const recurringParams = obj(p, "recurring");
  let recurring: PriceObject["recurring"] = null;
  if (recurringParams) {
    const interval = str(recurringParams, "interval");
    if (!interval) throw missingParam("recurring[interval]");
    if (!["day", "week", "month", "year"].includes(interval)) {
      throw invalidParam("recurring[interval]", `Invalid recurring[interval]: must be one of day, week, month, or year`);
    }
    recurring = {
      interval: interval as Interval,
      interval_count: int(recurringParams, "interval_count") ?? 1,
      meter: null,
      trial_period_days: null,
      usage_type: "licensed",
    };
  }
  const lookupKey = str(p, "lookup_key") ?? null;
  if (lookupKey) {
    const holder = [...store.prices.values()].find((x) => x.lookup_key === lookupKey);
    if (holder) {
      if (bool(p, "transfer_lookup_key") !== true) {
        throw invalidParam("lookup_key", `A price (\`${holder.id}\`) already uses that lookup key.`);
      }
      holder.lookup_key = null;
    }
  }
  const price: PriceObject = {
    id: newId("price"),
    object: "price",
    active: bool(p, "active") ?? true,
    billing_scheme: "per_unit",
    created: store.now(),
    currency: currency.toLowerCase(),
    custom_unit_amount: null,
    livemode: false,
    lookup_key: lookupKey,
    metadata: metadata(p) ?? {},
    nickname: str(p, "nickname") ?? null,
    product: product.id,
    recurring,
    tax_behavior: "unspecified",
    tiers_mode: null,
    transform_quantity: null,
    type: recurring ? "recurring" : "one_time",
    unit_amount: unitAmount,
    unit_amount_decimal: String(unitAmount),
  };
  store.prices.set(price.id, price);
  return clone(price);
}

export function retrievePrice(store: StandinStore, id: string): PriceObject {
  const price = store.prices.get(id);
  if (!price) throw noSuch("price", id);
  return clone(price);
}

export function listPrices(store: StandinStore, p: FormObject): ListResult<PriceObject> {
  const active = bool(p, "active");
  const product = str(p, "product");
  const type = str(p, "type");
  const lookupKeys = stringList(p, "lookup_keys");
  const items = [...store.prices.values()].filter(
    (x) =>
      (active === undefined || x.active === active) &&
      (!product || x.product === product) &&
      (!type || x.type === type) &&
      (!lookupKeys || (x.lookup_key !== null && lookupKeys.includes(x.lookup_key))),
  );
  return store.page(items, p, "/v1/prices");
}
