import { createPrefixedId, nowInUnixSeconds } from "../shared/ids";
import type { Invoice, Subscription, TestClock } from "./billing-objects";
import { recordCharge } from "./charges";
import type { ApiRequest, PaymentsEngine } from "./engine";
import type { CardPaymentMethod, PaymentIntent } from "./objects";
import { resolveCardOutcome } from "./test-cards";

/**
 * How the stand-in bills a subscription, after "How subscriptions work" and "Test clocks"
 * (Stripe documentation, 2025): a new subscription with `payment_behavior=default_incomplete`
 * opens its first invoice with a payment intent the browser confirms; paying it makes the
 * subscription `active` (and, with `save_default_payment_method=on_subscription`, keeps the card);
 * each period end bills a renewal invoice on the kept card; a failed renewal leaves the invoice
 * open and the subscription `past_due`; a test clock moves a customer's time forward and bills
 * every period end it passes. Stripe retries failed renewals on its own schedule ("Smart
 * Retries"); the stand-in does not, so a test pays the open invoice itself (`/pay` or the browser).
 */

/** The customer's clock time: its test clock's frozen time, or now. */
export function billingNow(engine: PaymentsEngine, customerId: string): number {
  const clockId = engine.state.customers.get(customerId)?.test_clock;
  const clock = clockId ? engine.state.testClocks.get(clockId) : undefined;
  return clock ? clock.frozen_time : nowInUnixSeconds();
}

/**
 * The anchor moved by whole months, keeping its day of the month and clamping to the month's
 * last day (a subscription started on the 31st renews on the 30th in April, February's last day
 * in February): "Billing cycle", Stripe documentation (from memory).
 */
export function addMonths(anchor: number, months: number): number {
  const start = new Date(anchor * 1000);
  const y = start.getUTCFullYear();
  const m = start.getUTCMonth() + months;
  const lastDay = new Date(Date.UTC(y, m + 1, 0)).getUTCDate();
  const day = Math.min(start.getUTCDate(), lastDay);
  return Math.floor(Date.UTC(y, m, day, start.getUTCHours(), start.getUTCMinutes(), start.getUTCSeconds()) / 1000);
}

function newIntent({ amount, currency, customer, description, created }: { amount: number; currency: string; customer: string; description: string; created: number }): PaymentIntent {
  const id = createPrefixedId({ prefix: "pi" });
  return {
    id,
    object: "payment_intent",
    amount,
    amount_capturable: 0,
    amount_received: 0,
    allowed_payment_method_types: null,
    automatic_payment_methods: { enabled: true },
    canceled_at: null,
    cancellation_reason: null,
    capture_method: "automatic_async",
    client_secret: `${id}_secret_${createPrefixedId({ prefix: "x" }).slice(2)}`,
    confirmation_method: "automatic",
    created,
    currency,
    customer,
    description,
    last_payment_error: null,
    latest_charge: null,
    livemode: false,
    metadata: {},
    next_action: null,
    payment_method: null,
    payment_method_types: ["card"],
    processing: null,
    receipt_email: null,
    setup_future_usage: "off_session",
    shipping: null,
    statement_descriptor: null,
    statement_descriptor_suffix: null,
    status: "requires_payment_method",
    transfer_group: null,
  };
}

/** Opens an invoice for one period of the subscription, with the payment intent that pays it. */
export function openInvoice({
  engine,
  subscription,
  reason,
  periodStart,
  periodEnd,
}: {
  engine: PaymentsEngine;
  subscription: Subscription;
  reason: Invoice["billing_reason"];
  periodStart: number;
  periodEnd: number;
}): Invoice {
  const item = subscription.items.data[0]!;
  const amount = item.price.unit_amount * item.quantity;
  const created = billingNow(engine, subscription.customer);
  const description = reason === "subscription_create" ? "Subscription creation" : "Subscription update";
  const intent = newIntent({ amount, currency: subscription.currency, customer: subscription.customer, description, created });
  engine.state.intents.set(intent.id, intent);
  const customer = engine.state.customers.get(subscription.customer);
  const id = createPrefixedId({ prefix: "in" });
  const invoice: Invoice = {
    id,
    object: "invoice",
    amount_due: amount,
    amount_paid: 0,
    amount_remaining: amount,
    attempt_count: 0,
    attempted: false,
    billing_reason: reason,
    collection_method: "charge_automatically",
    confirmation_secret: { client_secret: intent.client_secret, type: "payment_intent" },
    created,
    currency: subscription.currency,
    customer: subscription.customer,
    customer_email: customer?.email ?? null,
    customer_name: customer?.name ?? null,
    lines: {
      object: "list",
      data: [{ id: createPrefixedId({ prefix: "il" }), object: "line_item", amount, currency: subscription.currency, description: `1 × ${item.price.product} (at ${amount} / ${item.price.recurring?.interval ?? "month"})`, period: { start: periodStart, end: periodEnd } }],
      has_more: false,
      url: `/v1/invoices/${id}/lines`,
    },
    livemode: false,
    metadata: {},
    next_payment_attempt: null,
    parent: { type: "subscription_details", subscription_details: { subscription: subscription.id, metadata: { ...subscription.metadata } } },
    payments: {
      object: "list",
      data: [{ id: createPrefixedId({ prefix: "inpay" }), object: "invoice_payment", is_default: true, payment: { type: "payment_intent", payment_intent: intent.id }, status: "open" }],
      has_more: false,
      url: `/v1/invoice_payments?invoice=${id}`,
    },
    period_start: periodStart,
    period_end: periodEnd,
    status: "open",
    status_transitions: { finalized_at: created, paid_at: null, voided_at: null },
    test_clock: subscription.test_clock,
    total: amount,
  };
  engine.state.invoices.set(id, invoice);
  engine.state.invoiceOfIntent.set(intent.id, id);
  subscription.latest_invoice = id;
  return invoice;
}

function setStatus(engine: PaymentsEngine, subscription: Subscription, status: Subscription["status"], request: ApiRequest) {
  if (subscription.status === status) return;
  subscription.status = status;
  engine.emitEvent({ type: "customer.subscription.updated", object: subscription, request });
}

/** After the intent of an invoice was confirmed (by the browser, `/pay` or a renewal): the invoice and its subscription follow. */
export function settleInvoiceIntent({ engine, intent, request }: { engine: PaymentsEngine; intent: PaymentIntent; request: ApiRequest }) {
  const invoiceId = engine.state.invoiceOfIntent.get(intent.id);
  const invoice = invoiceId ? engine.state.invoices.get(invoiceId) : undefined;
  if (!invoice || invoice.status !== "open") return;
  const subscription = engine.state.subscriptions.get(invoice.parent.subscription_details.subscription);
  invoice.attempt_count += 1;
  invoice.attempted = true;
  if (intent.status === "succeeded") {
    invoice.status = "paid";
    invoice.amount_paid = invoice.amount_due;
    invoice.amount_remaining = 0;
    invoice.status_transitions.paid_at = billingNow(engine, invoice.customer);
    invoice.payments.data[0]!.status = "paid";
    if (subscription && (subscription.payment_settings.save_default_payment_method === "on_subscription" || !subscription.default_payment_method)) {
      subscription.default_payment_method = intent.payment_method;
    }
    engine.emitEvent({ type: "invoice.paid", object: invoice, request });
    if (subscription && (subscription.status === "incomplete" || subscription.status === "past_due")) setStatus(engine, subscription, "active", request);
    return;
  }
  engine.emitEvent({ type: "invoice.payment_failed", object: invoice, request });
  if (subscription && subscription.status === "active") setStatus(engine, subscription, "past_due", request);
}

/** Charges an open invoice off-session with a kept card (a renewal, or `/pay`). */
export function chargeInvoice({ engine, invoice, method, request }: { engine: PaymentsEngine; invoice: Invoice; method: CardPaymentMethod | null; request: ApiRequest }) {
  const intentId = invoice.payments.data[0]!.payment.payment_intent;
  const intent = engine.state.intents.get(intentId)!;
  if (!method) {
    // No card to charge: the attempt fails without a charge, as the real API's renewal does.
    intent.last_payment_error = null;
    invoice.attempt_count += 1;
    invoice.attempted = true;
    engine.emitEvent({ type: "invoice.payment_failed", object: invoice, request });
    const subscription = engine.state.subscriptions.get(invoice.parent.subscription_details.subscription);
    if (subscription?.status === "active") setStatus(engine, subscription, "past_due", request);
    return;
  }
  const outcome = resolveCardOutcome(engine.state.cardNumbers.get(method.id) ?? "");
  const charge = recordCharge({ engine, intent, method, outcome });
  intent.latest_charge = charge.id;
  if (outcome.kind === "succeeds") {
    intent.status = "succeeded";
    intent.payment_method = method.id;
    intent.amount_received = intent.amount;
    intent.last_payment_error = null;
    engine.emitEvent({ type: "payment_intent.succeeded", object: intent, request });
  } else {
    intent.status = "requires_payment_method";
    intent.last_payment_error = { type: "card_error", code: outcome.code, ...(outcome.declineCode ? { decline_code: outcome.declineCode } : {}), message: outcome.message, charge: charge.id, payment_method: method };
    engine.emitEvent({ type: "payment_intent.payment_failed", object: intent, request });
  }
  settleInvoiceIntent({ engine, intent, request });
}

/** Ends a subscription now (`DELETE /v1/subscriptions/:id`, or at a period end it was set to stop at). */
export function endSubscription({ engine, subscription, request }: { engine: PaymentsEngine; subscription: Subscription; request: ApiRequest }) {
  const now = billingNow(engine, subscription.customer);
  subscription.status = "canceled";
  subscription.canceled_at = subscription.canceled_at ?? now;
  subscription.ended_at = now;
  for (const invoice of engine.state.invoices.values()) {
    if (invoice.parent.subscription_details.subscription === subscription.id && invoice.status === "open") {
      invoice.status = "void";
      invoice.status_transitions.voided_at = now;
    }
  }
  engine.emitEvent({ type: "customer.subscription.deleted", object: subscription, request });
}

/** Moves a test clock forward, billing every period end of its customers' subscriptions it passes, in time order. */
export function advanceClock({ engine, clock, to, request }: { engine: PaymentsEngine; clock: TestClock; to: number; request: ApiRequest }) {
  for (;;) {
    let next: { subscription: Subscription; at: number } | null = null;
    for (const subscription of engine.state.subscriptions.values()) {
      if (subscription.test_clock !== clock.id) continue;
      if (subscription.status !== "active" && subscription.status !== "past_due") continue;
      const at = subscription.items.data[0]!.current_period_end;
      if (at <= to && (!next || at < next.at)) next = { subscription, at };
    }
    if (!next) break;
    clock.frozen_time = next.at;
    const { subscription, at } = next;
    if (subscription.cancel_at_period_end) {
      endSubscription({ engine, subscription, request });
      continue;
    }
    const item = subscription.items.data[0]!;
    const periods = Math.round((at - subscription.billing_cycle_anchor) / (30.4 * 86_400));
    let end = addMonths(subscription.billing_cycle_anchor, periods + 1);
    if (end <= at) end = addMonths(subscription.billing_cycle_anchor, periods + 2);
    item.current_period_start = at;
    item.current_period_end = end;
    const invoice = openInvoice({ engine, subscription, reason: "subscription_cycle", periodStart: at, periodEnd: end });
    const method = subscription.default_payment_method ? (engine.state.paymentMethods.get(subscription.default_payment_method) ?? null) : null;
    chargeInvoice({ engine, invoice, method, request });
  }
  clock.frozen_time = to;
}
