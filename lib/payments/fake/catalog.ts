// Products and Prices: create and retrieve, and the inline `price_data` / `product_data` a
// Checkout Session's line item may carry instead of a price id (the service then creates the
// price and product itself). One-time prices in whole minor units only (no tiers, no recurring).
import { priceObject, productObject } from "./objects";
import type { Params } from "./params";
import type { ApiObject, Store } from "./store";
import { ApiError, invalidParam, noSuch, type Clock } from "./wire";

/** The service's largest unit amount in minor units (8 digits; docs.stripe.com/api/prices/create). */
export const MAX_UNIT_AMOUNT = 99_999_999;

export function readCurrency(params: Params, key = "currency"): string {
  const value = params.requiredString(key).toLowerCase();
  // ISO 4217 alphabetic code; the stand-in does not check it is one the service settles in.
  if (!/^[a-z]{3}$/.test(value)) throw invalidParam(params.name(key), `Invalid currency: ${value}. Use a three-letter ISO currency code in lowercase.`);
  return value;
}

function readUnitAmount(params: Params): number {
  const decimal = params.string("unit_amount_decimal");
  if (params.has("unit_amount") && decimal !== undefined) {
    throw new ApiError(400, "invalid_request_error", "You may only specify one of these parameters: unit_amount, unit_amount_decimal.", undefined, params.name("unit_amount"));
  }
  if (decimal !== undefined) {
    if (!/^\d+$/.test(decimal)) throw invalidParam(params.name("unit_amount_decimal"), "The local payment stand-in accepts whole minor units only in unit_amount_decimal.");
    params.int("unit_amount_decimal", { min: 0, max: MAX_UNIT_AMOUNT });
    return Number(decimal);
  }
  const amount = params.int("unit_amount", { min: 0, max: MAX_UNIT_AMOUNT });
  if (amount === undefined) throw new ApiError(400, "invalid_request_error", "Missing required param: unit_amount.", "parameter_missing", params.name("unit_amount"));
  return amount;
}

export function createProduct(store: Store, clock: Clock, params: Params, opts: { active?: boolean } = {}): ApiObject {
  params.only(["name", "description", "metadata", "active", "id"]);
  const id = params.string("id");
  if (id !== undefined && store.state.products[id]) {
    throw new ApiError(400, "invalid_request_error", `Product already exists.`, "resource_already_exists", "id");
  }
  const product = productObject({
    id,
    name: params.requiredString("name"),
    description: params.string("description") ?? null,
    metadata: params.metadata() ?? {},
    active: params.boolean("active") ?? opts.active ?? true,
    created: clock.nowSeconds(),
  });
  store.state.products[product.id] = product;
  store.changed();
  return product;
}

export function createPrice(store: Store, clock: Clock, params: Params, opts: { inline?: boolean } = {}): ApiObject {
  const known = ["currency", "unit_amount", "unit_amount_decimal", "product", "product_data"];
  params.only(opts.inline ? known : [...known, "active", "metadata", "nickname", "lookup_key"]);
  const currency = readCurrency(params);
  const unitAmount = readUnitAmount(params);
  const productData = params.object("product_data");
  const productId = params.string("product");
  if (productData && productId) throw new ApiError(400, "invalid_request_error", "You may only specify one of these parameters: product, product_data.", undefined, params.name("product"));
  let product: string;
  if (productData) product = createProduct(store, clock, productData.only(["name", "description", "metadata"])).id;
  else if (productId) {
    if (!store.state.products[productId]) throw noSuch("product", productId, params.name("product"), 400);
    product = productId;
  } else throw new ApiError(400, "invalid_request_error", `Missing required param: ${params.name(opts.inline ? "product_data" : "product")}.`, "parameter_missing", params.name("product"));
  const price = priceObject({
    currency,
    unitAmount,
    product,
    // Prices made from price_data are not reusable: the service creates them inactive.
    active: opts.inline ? false : (params.boolean("active") ?? true),
    metadata: params.metadata() ?? {},
    nickname: params.string("nickname") ?? null,
    lookupKey: params.string("lookup_key") ?? null,
    created: clock.nowSeconds(),
  });
  store.state.prices[price.id] = price;
  store.changed();
  return price;
}

export function retrieve(store: Store, kind: "products" | "prices", id: string): ApiObject {
  const found = store.state[kind][id];
  if (!found) throw noSuch(kind === "products" ? "product" : "price", id);
  return found;
}
