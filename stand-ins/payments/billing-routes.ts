import { createPrefixedId, nowInUnixSeconds } from "../shared/ids";
import type { FormObject, FormValue } from "../shared/form-decode";
import { assertChargeableAmount, normalizeCurrency } from "./amounts";
import { addMonths, advanceClock, billingNow, chargeInvoice, endSubscription, openInvoice } from "./billing";
import type { Invoice, Price, Product, Subscription, TestClock } from "./billing-objects";
import type { ApiRequest, PaymentsEngine, RouteHandler } from "./engine";
import { invalidRequest, resourceMissing } from "./errors";
import {
  mergeMetadata,
  readOneOf,
  readOptionalBoolean,
  readOptionalInteger,
  readOptionalObject,
  readOptionalString,
  readRequiredString,
  readStringList,
  rejectUnknownParams,
} from "./params";
import { resolvePaymentMethodId } from "./payment-methods";

/**
 * Products, prices, subscriptions, invoices and test clocks. Parameter names follow the
 * `stripe` SDK v23 types (ProductCreateParams, PriceCreateParams, SubscriptionCreateParams,
 * SubscriptionUpdateParams, InvoicePayParams, TestHelpers.TestClockCreateParams); names the
 * stand-in does not act on are refused as the real API refuses unknown ones.
 */

function list<T>(url: string, data: T[]) {
  return { object: "list", data, has_more: false, url };
}

function readInteger(params: FormObject, name: string): number {
  const value = readOptionalInteger(params, name);
  if (value === undefined) throw invalidRequest({ message: `Missing required param: ${name}.`, param: name, code: "parameter_missing" });
  return value;
}

function entries(value: FormValue | undefined): FormObject[] {
  if (value === undefined) return [];
  const items = Array.isArray(value) ? value : typeof value === "object" ? Object.values(value) : [value];
  return items.map((item) => {
    if (typeof item !== "object" || Array.isArray(item)) throw invalidRequest({ message: "Invalid array", param: "items" });
    return item;
  });
}

// Products -------------------------------------------------------------------------------

function createProductRecord(engine: PaymentsEngine, params: FormObject): Product {
  const product: Product = {
    id: createPrefixedId({ prefix: "prod", length: 14 }),
    object: "product",
    active: true,
    created: nowInUnixSeconds(),
    livemode: false,
    metadata: mergeMetadata({ current: {}, params }),
    name: readRequiredString(params, "name"),
  };
  engine.state.products.set(product.id, product);
  return product;
}

export const createProduct: RouteHandler = ({ engine, request }) => {
  rejectUnknownParams({ params: request.params, allowed: ["name", "metadata", "description", "expand"] });
  return { status: 200, body: createProductRecord(engine, request.params) };
};

export const retrieveProduct: RouteHandler = ({ engine, id }) => {
  const product = engine.state.products.get(id);
  if (!product) throw resourceMissing({ kind: "product", id, param: "id" });
  return { status: 200, body: product };
};

// Prices ---------------------------------------------------------------------------------

function createPriceRecord(engine: PaymentsEngine, params: FormObject): Price {
  const currency = normalizeCurrency(readRequiredString(params, "currency"));
  const unitAmount = readInteger(params, "unit_amount");
  assertChargeableAmount({ amount: unitAmount, currency });
  const recurringParams = readOptionalObject(params, "recurring");
  const interval = recurringParams ? readOneOf(recurringParams, "interval", ["day", "week", "month", "year"] as const) : undefined;
  if (recurringParams && !interval) throw invalidRequest({ message: "Missing required param: recurring[interval].", param: "recurring[interval]", code: "parameter_missing" });
  let productId = readOptionalString(params, "product");
  const productData = readOptionalObject(params, "product_data");
  if (productId && !engine.state.products.has(productId)) throw resourceMissing({ kind: "product", id: productId, param: "product", status: 400 });
  if (!productId && productData) productId = createProductRecord(engine, productData).id;
  if (!productId) throw invalidRequest({ message: "Missing required param: product.", param: "product", code: "parameter_missing" });
  const price: Price = {
    id: createPrefixedId({ prefix: "price", length: 14 }),
    object: "price",
    active: true,
    created: nowInUnixSeconds(),
    currency,
    livemode: false,
    metadata: mergeMetadata({ current: {}, params }),
    product: productId,
    recurring: interval ? { interval, interval_count: 1 } : null,
    type: interval ? "recurring" : "one_time",
    unit_amount: unitAmount,
  };
  engine.state.prices.set(price.id, price);
  return price;
}

export const createPrice: RouteHandler = ({ engine, request }) => {
  rejectUnknownParams({ params: request.params, allowed: ["currency", "unit_amount", "recurring", "product", "product_data", "metadata", "nickname", "expand"] });
  return { status: 200, body: createPriceRecord(engine, request.params) };
};

export const retrievePrice: RouteHandler = ({ engine, id }) => {
  const price = engine.state.prices.get(id);
  if (!price) throw resourceMissing({ kind: "price", id, param: "id" });
  return { status: 200, body: price };
};

/** items[n][price] or items[n][price_data][…]: the one item a monthly gift has. */
function readItemPrice(engine: PaymentsEngine, item: FormObject): Price {
  const priceId = readOptionalString(item, "price");
  if (priceId) {
    const price = engine.state.prices.get(priceId);
    if (!price) throw resourceMissing({ kind: "price", id: priceId, param: "items[0][price]", status: 400 });
    return price;
  }
  const data = readOptionalObject(item, "price_data");
  if (!data) throw invalidRequest({ message: "Missing required param: items[0][price].", param: "items[0][price]", code: "parameter_missing" });
  return createPriceRecord(engine, data);
}

// Subscriptions --------------------------------------------------------------------------

function findSubscription(engine: PaymentsEngine, id: string): Subscription {
  const subscription = engine.state.subscriptions.get(id);
  if (!subscription) throw resourceMissing({ kind: "subscription", id, param: "id" });
  return subscription;
}

function presentInvoice(engine: PaymentsEngine, invoice: Invoice, expand: string[], prefix = ""): unknown {
  const view: Record<string, unknown> = { ...invoice };
  if (expand.includes(`${prefix}payments.data.payment.payment_intent`)) {
    view.payments = { ...invoice.payments, data: invoice.payments.data.map((p) => ({ ...p, payment: { ...p.payment, payment_intent: engine.state.intents.get(p.payment.payment_intent) } })) };
  }
  return view;
}

function presentSubscription(engine: PaymentsEngine, subscription: Subscription, request: ApiRequest): unknown {
  const expand = readStringList(request.params, "expand") ?? [];
  const view: Record<string, unknown> = { ...structuredClone(subscription) };
  if (expand.some((field) => field === "latest_invoice" || field.startsWith("latest_invoice.")) && subscription.latest_invoice) {
    const invoice = engine.state.invoices.get(subscription.latest_invoice);
    if (invoice) view.latest_invoice = presentInvoice(engine, invoice, expand, "latest_invoice.");
  }
  if (expand.includes("customer")) view.customer = engine.state.customers.get(subscription.customer) ?? subscription.customer;
  if (expand.includes("default_payment_method") && subscription.default_payment_method) {
    view.default_payment_method = engine.state.paymentMethods.get(subscription.default_payment_method) ?? subscription.default_payment_method;
  }
  return view;
}

const SUBSCRIPTION_CREATE_PARAMS = ["customer", "items", "payment_behavior", "payment_settings", "default_payment_method", "metadata", "description", "expand", "collection_method", "off_session"];
const SUBSCRIPTION_UPDATE_PARAMS = ["items", "proration_behavior", "default_payment_method", "metadata", "description", "cancel_at_period_end", "expand", "payment_behavior"];

export const createSubscription: RouteHandler = ({ engine, request }) => {
  const { params } = request;
  rejectUnknownParams({ params, allowed: SUBSCRIPTION_CREATE_PARAMS });
  const customerId = readRequiredString(params, "customer");
  const customer = engine.state.customers.get(customerId);
  if (!customer) throw resourceMissing({ kind: "customer", id: customerId, param: "customer", status: 400 });
  const items = entries(params.items);
  if (items.length !== 1) throw invalidRequest({ message: "The local payments stand-in bills exactly one subscription item.", param: "items" });
  const price = readItemPrice(engine, items[0]!);
  if (price.recurring?.interval !== "month") throw invalidRequest({ message: "The price must be recurring monthly.", param: "items[0][price]" });
  const behavior = readOneOf(params, "payment_behavior", ["allow_incomplete", "default_incomplete", "error_if_incomplete", "pending_if_incomplete"] as const) ?? "allow_incomplete";
  const paymentSettings = readOptionalObject(params, "payment_settings");
  const save = paymentSettings ? readOneOf(paymentSettings, "save_default_payment_method", ["on_subscription", "off"] as const) : undefined;
  const methodId = readOptionalString(params, "default_payment_method");
  const method = methodId ? resolvePaymentMethodId({ engine, id: methodId }) : null;
  const now = billingNow(engine, customerId);
  const id = createPrefixedId({ prefix: "sub" });
  const subscription: Subscription = {
    id,
    object: "subscription",
    billing_cycle_anchor: now,
    cancel_at_period_end: false,
    canceled_at: null,
    collection_method: "charge_automatically",
    created: now,
    currency: price.currency,
    customer: customerId,
    default_payment_method: method?.id ?? null,
    description: readOptionalString(params, "description") ?? null,
    ended_at: null,
    items: {
      object: "list",
      data: [{ id: createPrefixedId({ prefix: "si", length: 14 }), object: "subscription_item", created: now, current_period_start: now, current_period_end: addMonths(now, 1), metadata: {}, price, quantity: 1, subscription: id }],
      has_more: false,
      url: `/v1/subscription_items?subscription=${id}`,
    },
    latest_invoice: null,
    livemode: false,
    metadata: mergeMetadata({ current: {}, params }),
    payment_settings: { save_default_payment_method: save ?? "off" },
    start_date: now,
    status: "incomplete",
    test_clock: customer.test_clock,
  };
  engine.state.subscriptions.set(id, subscription);
  engine.emitEvent({ type: "customer.subscription.created", object: subscription, request });
  const invoice = openInvoice({ engine, subscription, reason: "subscription_create", periodStart: now, periodEnd: now });
  // With a card already on file and no request to wait, the first invoice is charged now.
  if (behavior !== "default_incomplete" && method) chargeInvoice({ engine, invoice, method, request });
  return { status: 200, body: presentSubscription(engine, subscription, request) };
};

export const retrieveSubscription: RouteHandler = ({ engine, request, id }) => ({ status: 200, body: presentSubscription(engine, findSubscription(engine, id), request) });

export const listSubscriptions: RouteHandler = ({ engine, request }) => {
  const customer = readOptionalString(request.params, "customer");
  const data = [...engine.state.subscriptions.values()].filter((s) => !customer || s.customer === customer);
  return { status: 200, body: list("/v1/subscriptions", data) };
};

export const updateSubscription: RouteHandler = ({ engine, request, id }) => {
  const { params } = request;
  rejectUnknownParams({ params, allowed: SUBSCRIPTION_UPDATE_PARAMS });
  const subscription = findSubscription(engine, id);
  if (subscription.status === "canceled") {
    throw invalidRequest({ message: "A canceled subscription can only update its cancellation_details and metadata.", param: "id" });
  }
  const items = entries(params.items);
  if (items.length > 1) throw invalidRequest({ message: "The local payments stand-in bills exactly one subscription item.", param: "items" });
  if (items[0]) {
    const item = subscription.items.data[0]!;
    const named = readOptionalString(items[0], "id");
    if (named && named !== item.id) throw resourceMissing({ kind: "subscription_item", id: named, param: "items[0][id]", status: 400 });
    const price = readItemPrice(engine, items[0]);
    if (price.recurring?.interval !== "month") throw invalidRequest({ message: "The price must be recurring monthly.", param: "items[0][price]" });
    // The next invoice bills the new price; no proration (the stand-in ignores proration_behavior).
    item.price = price;
  }
  readOneOf(params, "proration_behavior", ["none", "create_prorations", "always_invoice"] as const);
  const methodId = readOptionalString(params, "default_payment_method");
  if (methodId) subscription.default_payment_method = resolvePaymentMethodId({ engine, id: methodId }).id;
  const stopAtEnd = readOptionalBoolean(params, "cancel_at_period_end");
  if (stopAtEnd !== undefined) subscription.cancel_at_period_end = stopAtEnd;
  subscription.metadata = mergeMetadata({ current: subscription.metadata, params });
  engine.emitEvent({ type: "customer.subscription.updated", object: subscription, request });
  return { status: 200, body: presentSubscription(engine, subscription, request) };
};

export const cancelSubscription: RouteHandler = ({ engine, request, id }) => {
  rejectUnknownParams({ params: request.params, allowed: ["expand", "invoice_now", "prorate", "cancellation_details"] });
  const subscription = findSubscription(engine, id);
  if (subscription.status === "canceled") {
    throw invalidRequest({ message: `No such subscription: '${id}' is already canceled.`, param: "id", code: "resource_missing" });
  }
  endSubscription({ engine, subscription, request });
  return { status: 200, body: presentSubscription(engine, subscription, request) };
};

// Invoices -------------------------------------------------------------------------------

function findInvoice(engine: PaymentsEngine, id: string): Invoice {
  const invoice = engine.state.invoices.get(id);
  if (!invoice) throw resourceMissing({ kind: "invoice", id, param: "id" });
  return invoice;
}

export const retrieveInvoice: RouteHandler = ({ engine, request, id }) => ({
  status: 200,
  body: presentInvoice(engine, findInvoice(engine, id), readStringList(request.params, "expand") ?? []),
});

export const listInvoices: RouteHandler = ({ engine, request }) => {
  rejectUnknownParams({ params: request.params, allowed: ["subscription", "customer", "status", "limit", "expand"] });
  const subscription = readOptionalString(request.params, "subscription");
  const customer = readOptionalString(request.params, "customer");
  const status = readOptionalString(request.params, "status");
  const data = [...engine.state.invoices.values()]
    .filter((i) => (!subscription || i.parent.subscription_details.subscription === subscription) && (!customer || i.customer === customer) && (!status || i.status === status))
    .sort((a, b) => b.created - a.created);
  return { status: 200, body: list("/v1/invoices", data) };
};

/** Pays an open invoice now with the given card or the subscription's kept one. */
export const payInvoice: RouteHandler = ({ engine, request, id }) => {
  rejectUnknownParams({ params: request.params, allowed: ["payment_method", "off_session", "expand"] });
  const invoice = findInvoice(engine, id);
  if (invoice.status !== "open") throw invalidRequest({ message: `Invoice is already ${invoice.status}.`, code: "invoice_not_editable" });
  const subscription = engine.state.subscriptions.get(invoice.parent.subscription_details.subscription);
  const methodId = readOptionalString(request.params, "payment_method") ?? subscription?.default_payment_method ?? null;
  const method = methodId ? resolvePaymentMethodId({ engine, id: methodId }) : null;
  if (method && subscription && readOptionalString(request.params, "payment_method")) subscription.default_payment_method = method.id;
  chargeInvoice({ engine, invoice, method, request });
  if ((invoice.status as Invoice["status"]) !== "paid") {
    throw invalidRequest({ message: "The invoice could not be paid with that card.", code: "card_declined" });
  }
  return { status: 200, body: invoice };
};

// Test clocks ----------------------------------------------------------------------------

function findClock(engine: PaymentsEngine, id: string): TestClock {
  const clock = engine.state.testClocks.get(id);
  if (!clock) throw resourceMissing({ kind: "test_helpers.test_clock", id, param: "id" });
  return clock;
}

export const createTestClock: RouteHandler = ({ engine, request }) => {
  rejectUnknownParams({ params: request.params, allowed: ["frozen_time", "name"] });
  const frozen = readInteger(request.params, "frozen_time");
  const clock: TestClock = {
    id: createPrefixedId({ prefix: "clock", length: 14 }),
    object: "test_helpers.test_clock",
    created: nowInUnixSeconds(),
    deletes_after: nowInUnixSeconds() + 30 * 86_400,
    frozen_time: frozen,
    livemode: false,
    name: readOptionalString(request.params, "name") ?? null,
    status: "ready",
  };
  engine.state.testClocks.set(clock.id, clock);
  return { status: 200, body: clock };
};

export const retrieveTestClock: RouteHandler = ({ engine, id }) => ({ status: 200, body: findClock(engine, id) });

export const advanceTestClock: RouteHandler = ({ engine, request, id }) => {
  rejectUnknownParams({ params: request.params, allowed: ["frozen_time"] });
  const clock = findClock(engine, id);
  const to = readInteger(request.params, "frozen_time");
  if (to <= clock.frozen_time) {
    throw invalidRequest({ message: "The test clock can only move forward: frozen_time must be after the current frozen time.", param: "frozen_time" });
  }
  // The real clock advances in the background (status "advancing"); the stand-in finishes before answering.
  advanceClock({ engine, clock, to, request });
  return { status: 200, body: clock };
};
