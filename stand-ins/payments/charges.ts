import { createPrefixedId, nowInUnixSeconds } from "../shared/ids";
import type { PaymentsEngine } from "./engine";
import type { CardPaymentMethod, Charge, PaymentIntent } from "./objects";
import type { CardOutcome } from "./test-cards";

/** Records one charge attempt for a PaymentIntent; a decline is a failed charge, as in the real API. */
export function recordCharge({
  engine,
  intent,
  method,
  outcome,
}: {
  engine: PaymentsEngine;
  intent: PaymentIntent;
  method: CardPaymentMethod;
  outcome: CardOutcome;
}): Charge {
  const id = createPrefixedId({ prefix: "ch" });
  const succeeded = outcome.kind === "succeeds";
  const charge: Charge = {
    id,
    object: "charge",
    amount: intent.amount,
    amount_captured: succeeded ? intent.amount : 0,
    amount_refunded: 0,
    billing_details: method.billing_details,
    captured: succeeded,
    created: nowInUnixSeconds(),
    currency: intent.currency,
    customer: intent.customer,
    description: intent.description,
    failure_code: succeeded ? null : outcome.code,
    failure_message: succeeded ? null : outcome.message,
    livemode: false,
    metadata: { ...intent.metadata },
    outcome: succeeded
      ? {
          network_status: "approved_by_network",
          reason: null,
          seller_message: "Payment complete.",
          type: "authorized",
        }
      : {
          network_status: "declined_by_network",
          reason: outcome.declineCode ?? outcome.code,
          seller_message: "The bank did not return any further details with this decline.",
          type: "issuer_declined",
        },
    paid: succeeded,
    payment_intent: intent.id,
    payment_method: method.id,
    payment_method_details: {
      type: "card",
      card: {
        brand: method.card.brand,
        last4: method.card.last4,
        exp_month: method.card.exp_month,
        exp_year: method.card.exp_year,
      },
    },
    receipt_email: intent.receipt_email,
    receipt_url: null,
    refunded: false,
    refunds: { object: "list", data: [], has_more: false, url: `/v1/charges/${id}/refunds` },
    status: succeeded ? "succeeded" : "failed",
  };
  engine.state.charges.set(id, charge);
  return charge;
}
