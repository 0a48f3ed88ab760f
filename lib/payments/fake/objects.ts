// The shapes of the objects the stand-in serves, field for field as the service's API reference
// lists them for the pinned API version (docs.stripe.com/api: Products, Prices, Checkout Sessions,
// Line items, PaymentIntents, Charges, Refunds, Events). Features the stand-in lacks (tax,
// discounts, shipping, customers, subscriptions) keep their fields with the service's "off" value
// (null, false, []), so a client reading them finds what the service would send without them.
import type { ApiObject, StoredSession } from "./store";
import { newId } from "./wire";

const LIVEMODE = false;

export function productObject(p: { name: string; description: string | null; metadata: Record<string, string>; active: boolean; created: number; id?: string }): ApiObject {
  return {
    id: p.id ?? newId("prod", 14),
    object: "product",
    active: p.active,
    created: p.created,
    default_price: null,
    description: p.description,
    images: [],
    livemode: LIVEMODE,
    marketing_features: [],
    metadata: p.metadata,
    name: p.name,
    package_dimensions: null,
    shippable: null,
    statement_descriptor: null,
    tax_code: null,
    tax_details: null,
    type: "service",
    unit_label: null,
    updated: p.created,
    url: null,
  };
}

export function priceObject(p: { currency: string; unitAmount: number; product: string; active: boolean; metadata: Record<string, string>; nickname: string | null; lookupKey: string | null; created: number }): ApiObject {
  return {
    id: newId("price"),
    object: "price",
    active: p.active,
    billing_scheme: "per_unit",
    created: p.created,
    currency: p.currency,
    custom_unit_amount: null,
    livemode: LIVEMODE,
    lookup_key: p.lookupKey,
    metadata: p.metadata,
    nickname: p.nickname,
    product: p.product,
    recurring: null,
    tax_behavior: "unspecified",
    tiers_mode: null,
    transform_quantity: null,
    type: "one_time",
    unit_amount: p.unitAmount,
    unit_amount_decimal: String(p.unitAmount),
  };
}

export function lineItemObject(price: ApiObject, description: string, quantity: number): ApiObject {
  const amount = (price.unit_amount as number) * quantity;
  return {
    id: newId("li"),
    object: "item",
    adjustable_quantity: null,
    amount_discount: 0,
    amount_subtotal: amount,
    amount_tax: 0,
    amount_total: amount,
    currency: price.currency,
    description,
    metadata: {},
    price,
    quantity,
  };
}

type SessionInput = {
  created: number;
  expiresAt: number;
  currency: string;
  amountTotal: number;
  metadata: Record<string, string>;
  clientReferenceId: string | null;
  customerEmail: string | null;
  successUrl: string | null;
  cancelUrl: string | null;
  paymentMethodTypes: string[];
  locale: string | null;
  submitType: string | null;
  pageUrl: (id: string) => string;
};

export function sessionObject(s: SessionInput): StoredSession["session"] {
  const id = newId("cs_test", 58);
  return {
    id,
    object: "checkout.session",
    adaptive_pricing: null,
    after_expiration: null,
    allow_promotion_codes: null,
    amount_subtotal: s.amountTotal,
    amount_total: s.amountTotal,
    automatic_tax: { enabled: false, liability: null, provider: null, status: null },
    billing_address_collection: null,
    cancel_url: s.cancelUrl,
    client_reference_id: s.clientReferenceId,
    client_secret: null,
    collected_information: null,
    consent: null,
    consent_collection: null,
    created: s.created,
    currency: s.currency,
    currency_conversion: null,
    custom_fields: [],
    custom_text: { after_submit: null, shipping_address: null, submit: null, terms_of_service_acceptance: null },
    customer: null,
    customer_creation: "if_required",
    customer_details: s.customerEmail ? customerDetails(s.customerEmail) : null,
    customer_email: s.customerEmail,
    discounts: [],
    expires_at: s.expiresAt,
    invoice: null,
    invoice_creation: { enabled: false, invoice_data: { account_tax_ids: null, custom_fields: null, description: null, footer: null, issuer: null, metadata: {}, rendering_options: null } },
    livemode: LIVEMODE,
    locale: s.locale,
    metadata: s.metadata,
    mode: "payment",
    payment_intent: null,
    payment_link: null,
    payment_method_collection: "if_required",
    payment_method_configuration_details: null,
    payment_method_options: {},
    payment_method_types: s.paymentMethodTypes,
    payment_status: s.amountTotal === 0 ? "no_payment_required" : "unpaid",
    phone_number_collection: { enabled: false },
    recovered_from: null,
    saved_payment_method_options: null,
    setup_intent: null,
    shipping_address_collection: null,
    shipping_cost: null,
    shipping_options: [],
    status: "open",
    submit_type: s.submitType,
    subscription: null,
    success_url: s.successUrl,
    total_details: { amount_discount: 0, amount_shipping: 0, amount_tax: 0 },
    ui_mode: "hosted",
    url: s.pageUrl(id),
    wallet_options: null,
  };
}

export function customerDetails(email: string) {
  return { address: null, business_name: null, email, individual_name: null, name: null, phone: null, tax_exempt: "none", tax_ids: [] };
}

export function paymentIntentObject(p: { amount: number; currency: string; created: number; metadata: Record<string, string>; description: string | null; method: string }): ApiObject {
  return {
    id: newId("pi"),
    object: "payment_intent",
    allowed_payment_method_types: [p.method],
    amount: p.amount,
    amount_capturable: 0,
    amount_received: 0,
    application: null,
    application_fee_amount: null,
    automatic_payment_methods: null,
    canceled_at: null,
    cancellation_reason: null,
    capture_method: "automatic_async",
    client_secret: null,
    confirmation_method: "automatic",
    created: p.created,
    currency: p.currency,
    customer: null,
    customer_account: null,
    description: p.description,
    excluded_payment_method_types: null,
    last_payment_error: null,
    latest_charge: null,
    livemode: LIVEMODE,
    managed_payments: null,
    metadata: p.metadata,
    next_action: null,
    on_behalf_of: null,
    payment_method: newId("pm"),
    payment_method_configuration_details: null,
    payment_method_options: {},
    payment_method_types: [p.method],
    payment_record: null,
    processing: null,
    receipt_email: null,
    review: null,
    setup_future_usage: null,
    shipping: null,
    source: null,
    statement_descriptor: null,
    statement_descriptor_suffix: null,
    status: "processing",
    transfer_group: null,
  };
}

export function chargeObject(intent: ApiObject, p: { created: number; email: string | null; method: string }): ApiObject {
  return {
    id: newId("ch"),
    object: "charge",
    amount: intent.amount,
    amount_captured: 0,
    amount_refunded: 0,
    application: null,
    application_fee: null,
    application_fee_amount: null,
    balance_transaction: null,
    billing_details: { address: null, email: p.email, name: null, phone: null },
    calculated_statement_descriptor: "AXISLINE",
    captured: false,
    created: p.created,
    currency: intent.currency,
    customer: null,
    description: intent.description,
    disputed: false,
    failure_balance_transaction: null,
    failure_code: null,
    failure_message: null,
    fraud_details: {},
    livemode: LIVEMODE,
    metadata: intent.metadata,
    on_behalf_of: null,
    outcome: null,
    paid: false,
    payment_intent: intent.id,
    payment_method: intent.payment_method,
    payment_method_details: { type: p.method },
    receipt_email: p.email,
    receipt_number: null,
    receipt_url: null,
    refunded: false,
    review: null,
    shipping: null,
    source: null,
    source_transfer: null,
    statement_descriptor: null,
    statement_descriptor_suffix: null,
    status: "pending",
    transfer_data: null,
    transfer_group: null,
  };
}

export function refundObject(charge: ApiObject, p: { amount: number; created: number; reason: string | null; metadata: Record<string, string> }): ApiObject {
  return {
    id: newId("re"),
    object: "refund",
    amount: p.amount,
    balance_transaction: null,
    charge: charge.id,
    created: p.created,
    currency: charge.currency,
    customer: null,
    customer_account: null,
    destination_details: null,
    metadata: p.metadata,
    payment_intent: charge.payment_intent,
    payment_method: charge.payment_method,
    reason: p.reason,
    receipt_number: null,
    source_transfer_reversal: null,
    status: "succeeded",
    transfer_reversal: null,
  };
}
