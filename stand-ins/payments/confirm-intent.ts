import { settleInvoiceIntent } from "./billing";
import { recordCharge } from "./charges";
import type { ApiRequest, ApiResponse, PaymentsEngine } from "./engine";
import { StripeApiError, invalidRequest } from "./errors";
import type { CardPaymentMethod, PaymentIntent, PaymentIntentStatus } from "./objects";
import {
  readOptionalEmail,
  readOptionalObject,
  readOptionalString,
  rejectUnknownParams,
} from "./params";
import { createPaymentMethodFromData, resolvePaymentMethodId } from "./payment-methods";
import { presentIntent } from "./present";
import { resolveCardOutcome } from "./test-cards";

/**
 * Confirming a PaymentIntent: success moves it to `succeeded`; a decline answers HTTP 402
 * `card_error`, leaves it in `requires_payment_method` with `last_payment_error`, and it can be
 * confirmed again with another card. Source: "How intents work" and "Error codes", Stripe
 * documentation (2024).
 */

// PaymentIntentConfirmParams in the `stripe` SDK v23 types (secret key).
const SECRET_CONFIRM_PARAMS = [
  "capture_method",
  "error_on_requires_action",
  "expand",
  "mandate_data",
  "off_session",
  "payment_method",
  "payment_method_data",
  "payment_method_options",
  "receipt_email",
  "return_url",
  "setup_future_usage",
  "shipping",
  "use_stripe_sdk",
];
// What the browser library sends with a publishable key.
const PUBLISHABLE_CONFIRM_PARAMS = [
  "client_secret",
  "expand",
  "key",
  "payment_method",
  "payment_method_data",
  "receipt_email",
  "return_url",
  "shipping",
  "use_stripe_sdk",
  "save_payment_method",
  "setup_future_usage",
];
const CONFIRMABLE: readonly PaymentIntentStatus[] = [
  "requires_payment_method",
  "requires_confirmation",
  "requires_action",
];

function checkCaller({ intent, request }: { intent: PaymentIntent; request: ApiRequest }) {
  const publishable = request.auth.kind === "publishable";
  rejectUnknownParams({
    params: request.params,
    allowed: publishable ? PUBLISHABLE_CONFIRM_PARAMS : SECRET_CONFIRM_PARAMS,
  });
  if (publishable && readOptionalString(request.params, "client_secret") !== intent.client_secret) {
    throw invalidRequest({
      message:
        "The client_secret provided does not match the client_secret associated with the PaymentIntent.",
      param: "client_secret",
    });
  }
  const card = readOptionalObject(request.params, "payment_method_data")?.card;
  if (
    !publishable &&
    typeof card === "object" &&
    !Array.isArray(card) &&
    card.number !== undefined
  ) {
    // The real API refuses raw card numbers from servers unless specially enabled; so does the stand-in.
    throw invalidRequest({
      message:
        "Sending card numbers with a secret key is not allowed: use a test PaymentMethod such as pm_card_visa.",
      param: "payment_method_data[card][number]",
    });
  }
}

function choosePaymentMethod({
  engine,
  intent,
  request,
}: {
  engine: PaymentsEngine;
  intent: PaymentIntent;
  request: ApiRequest;
}): CardPaymentMethod {
  const data = readOptionalObject(request.params, "payment_method_data");
  if (data) return createPaymentMethodFromData({ engine, data });
  const named = readOptionalString(request.params, "payment_method") ?? intent.payment_method;
  if (!named) {
    throw invalidRequest({
      message: `You cannot confirm this PaymentIntent because it's missing a payment method. Pass payment_method when confirming ${intent.id}.`,
      param: "payment_method",
      code: "payment_intent_unexpected_state",
    });
  }
  return resolvePaymentMethodId({ engine, id: named });
}

export function confirmIntent({
  engine,
  request,
  intent,
}: {
  engine: PaymentsEngine;
  request: ApiRequest;
  intent: PaymentIntent;
}): ApiResponse {
  checkCaller({ intent, request });
  if (!CONFIRMABLE.includes(intent.status)) {
    throw invalidRequest({
      message: `You cannot confirm this PaymentIntent because it has a status of ${intent.status}. Only a PaymentIntent with one of the following statuses may be confirmed: ${CONFIRMABLE.join(", ")}.`,
      code: "payment_intent_unexpected_state",
      paymentIntent: presentIntent({ engine, intent, request }),
    });
  }
  const method = choosePaymentMethod({ engine, intent, request });
  const receiptEmail = readOptionalEmail(request.params, "receipt_email");
  if (receiptEmail !== undefined) intent.receipt_email = receiptEmail;
  if (request.params.shipping !== undefined) intent.shipping = request.params.shipping;

  const outcome = resolveCardOutcome(engine.state.cardNumbers.get(method.id) ?? "");
  const charge = recordCharge({ engine, intent, method, outcome });
  intent.latest_charge = charge.id;
  if (outcome.kind === "succeeds") {
    intent.status = "succeeded";
    intent.payment_method = method.id;
    intent.amount_received = intent.amount;
    intent.last_payment_error = null;
    engine.emitEvent({ type: "payment_intent.succeeded", object: intent, request });
    settleInvoiceIntent({ engine, intent, request });
    return { status: 200, body: presentIntent({ engine, intent, request }) };
  }
  intent.status = "requires_payment_method";
  intent.payment_method = null;
  intent.last_payment_error = {
    type: "card_error",
    code: outcome.code,
    ...(outcome.declineCode ? { decline_code: outcome.declineCode } : {}),
    message: outcome.message,
    charge: charge.id,
    payment_method: method,
  };
  engine.emitEvent({ type: "payment_intent.payment_failed", object: intent, request });
  settleInvoiceIntent({ engine, intent, request });
  throw new StripeApiError({
    status: 402,
    body: {
      type: "card_error",
      code: outcome.code,
      ...(outcome.declineCode ? { decline_code: outcome.declineCode } : {}),
      message: outcome.message,
      charge: charge.id,
      payment_intent: presentIntent({ engine, intent, request }),
      payment_method: method,
    },
  });
}
