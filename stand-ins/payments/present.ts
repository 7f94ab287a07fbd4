import type { ApiRequest, PaymentsEngine } from "./engine";
import { toPublishableView, type PaymentIntent, type Refund } from "./objects";
import { readStringList } from "./params";

/**
 * Shapes objects for the answer: `expand[]` swaps an id for its object (one level, the
 * fields an order flow expands), and a publishable key sees only the browser-safe subset.
 */

function readExpand(request: ApiRequest): string[] {
  return readStringList(request.params, "expand") ?? [];
}

export function presentIntent({
  engine,
  intent,
  request,
}: {
  engine: PaymentsEngine;
  intent: PaymentIntent;
  request: ApiRequest;
}): unknown {
  if (request.auth.kind === "publishable") {
    const view: Record<string, unknown> = { ...toPublishableView(intent) };
    if (readExpand(request).includes("payment_method") && intent.payment_method) {
      view.payment_method =
        engine.state.paymentMethods.get(intent.payment_method) ?? intent.payment_method;
    }
    return view;
  }
  const expanded: Record<string, unknown> = { ...intent };
  for (const field of readExpand(request)) {
    if (field === "latest_charge" && intent.latest_charge) {
      expanded.latest_charge =
        engine.state.charges.get(intent.latest_charge) ?? intent.latest_charge;
    } else if (field === "payment_method" && intent.payment_method) {
      expanded.payment_method =
        engine.state.paymentMethods.get(intent.payment_method) ?? intent.payment_method;
    } else if (field === "customer" && intent.customer) {
      expanded.customer = engine.state.customers.get(intent.customer) ?? intent.customer;
    }
  }
  return expanded;
}

export function presentRefund({
  engine,
  refund,
  request,
}: {
  engine: PaymentsEngine;
  refund: Refund;
  request: ApiRequest;
}): unknown {
  const expanded: Record<string, unknown> = { ...refund };
  for (const field of readExpand(request)) {
    if (field === "charge")
      expanded.charge = engine.state.charges.get(refund.charge) ?? refund.charge;
    if (field === "payment_intent") {
      expanded.payment_intent =
        engine.state.intents.get(refund.payment_intent) ?? refund.payment_intent;
    }
  }
  return expanded;
}
