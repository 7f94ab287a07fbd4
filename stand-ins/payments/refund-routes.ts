import { createPrefixedId, nowInUnixSeconds } from "../shared/ids";
import { formatMinorAmount } from "./amounts";
import type { PaymentsEngine, RouteHandler } from "./engine";
import { invalidRequest, resourceMissing } from "./errors";
import type { Charge, PaymentIntent, Refund } from "./objects";
import {
  mergeMetadata,
  readOneOf,
  readOptionalInteger,
  readOptionalString,
  rejectUnknownParams,
} from "./params";
import { presentRefund } from "./present";

/**
 * Refunds of a succeeded card payment, whole or in parts, never more than what is left.
 * Emits `charge.refunded` with the charge (its `payment_intent`, `amount_refunded`, `refunded`).
 * Source: "Refunds" API reference and "Refund and cancel payments", Stripe documentation (2024).
 */

const REFUND_PARAMS = [
  "amount",
  "charge",
  "expand",
  "metadata",
  "payment_intent",
  "reason",
  "instructions_email",
];

function findRefundTarget({
  engine,
  paymentIntentId,
  chargeId,
}: {
  engine: PaymentsEngine;
  paymentIntentId: string | undefined;
  chargeId: string | undefined;
}): { intent: PaymentIntent; charge: Charge } {
  if (!paymentIntentId && !chargeId) {
    throw invalidRequest({
      message:
        "One of the following params should be provided for this request: payment_intent or charge.",
    });
  }
  let intent: PaymentIntent | undefined;
  if (paymentIntentId) {
    intent = engine.state.intents.get(paymentIntentId);
    if (!intent)
      throw resourceMissing({
        kind: "payment_intent",
        id: paymentIntentId,
        param: "payment_intent",
        status: 400,
      });
  }
  const resolvedChargeId = chargeId ?? intent?.latest_charge ?? undefined;
  const charge = resolvedChargeId ? engine.state.charges.get(resolvedChargeId) : undefined;
  if (chargeId && !charge)
    throw resourceMissing({ kind: "charge", id: chargeId, param: "charge", status: 400 });
  intent ??= charge ? engine.state.intents.get(charge.payment_intent) : undefined;
  if (!intent || !charge || intent.status !== "succeeded" || charge.status !== "succeeded") {
    throw invalidRequest({
      message: `This PaymentIntent (${paymentIntentId ?? intent?.id}) does not have a successful charge to refund.`,
      param: paymentIntentId ? "payment_intent" : "charge",
    });
  }
  return { intent, charge };
}

export const createRefund: RouteHandler = ({ engine, request }) => {
  const { params } = request;
  rejectUnknownParams({ params, allowed: REFUND_PARAMS });
  const { intent, charge } = findRefundTarget({
    engine,
    paymentIntentId: readOptionalString(params, "payment_intent"),
    chargeId: readOptionalString(params, "charge"),
  });
  const remaining = charge.amount_captured - charge.amount_refunded;
  if (remaining <= 0) {
    throw invalidRequest({
      message: `Charge ${charge.id} has already been refunded.`,
      code: "charge_already_refunded",
    });
  }
  const amount = readOptionalInteger(params, "amount") ?? remaining;
  if (amount < 1) {
    throw invalidRequest({
      message: "This value must be greater than or equal to 1.",
      param: "amount",
    });
  }
  if (amount > remaining) {
    const money = (value: number) =>
      formatMinorAmount({ amount: value, currency: charge.currency });
    throw invalidRequest({
      message: `Refund amount (${money(amount)}) is greater than unrefunded amount on charge (${money(remaining)})`,
      param: "amount",
      code: "amount_too_large",
    });
  }
  const refund: Refund = {
    id: createPrefixedId({ prefix: "re" }),
    object: "refund",
    amount,
    balance_transaction: createPrefixedId({ prefix: "txn" }),
    charge: charge.id,
    created: nowInUnixSeconds(),
    currency: charge.currency,
    metadata: mergeMetadata({ current: {}, params }),
    payment_intent: intent.id,
    reason:
      readOneOf(params, "reason", ["duplicate", "fraudulent", "requested_by_customer"] as const) ??
      null,
    receipt_number: null,
    status: "succeeded",
  };
  engine.state.refunds.set(refund.id, refund);
  charge.amount_refunded += amount;
  charge.refunded = charge.amount_refunded >= charge.amount_captured;
  charge.refunds.data.unshift(refund);
  engine.emitEvent({ type: "charge.refunded", object: charge, request });
  return { status: 200, body: presentRefund({ engine, refund, request }) };
};

export const retrieveRefund: RouteHandler = ({ engine, request, id }) => {
  const refund = engine.state.refunds.get(id);
  if (!refund) throw resourceMissing({ kind: "refund", id, param: "refund" });
  return { status: 200, body: presentRefund({ engine, refund, request }) };
};
