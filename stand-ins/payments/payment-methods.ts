import type { FormObject } from "../shared/form-decode";
import { createPrefixedId, nowInUnixSeconds } from "../shared/ids";
import type { PaymentsEngine } from "./engine";
import { StripeApiError, invalidRequest, resourceMissing } from "./errors";
import type { CardPaymentMethod } from "./objects";
import {
  TEST_PAYMENT_METHOD_TOKENS,
  detectCardBrand,
  findCardDetailsProblem,
  normalizeCardNumber,
} from "./test-cards";

/** Turns what a confirm call names (a test token, a stored `pm_…`, or raw card fields) into a card PaymentMethod. */

function storeCardPaymentMethod({
  engine,
  digits,
  expMonth,
  expYear,
  billingDetails,
}: {
  engine: PaymentsEngine;
  digits: string;
  expMonth: number;
  expYear: number;
  billingDetails?: FormObject;
}): CardPaymentMethod {
  const text = (key: string) => {
    const value = billingDetails?.[key];
    return typeof value === "string" && value !== "" ? value : null;
  };
  const method: CardPaymentMethod = {
    id: createPrefixedId({ prefix: "pm" }),
    object: "payment_method",
    type: "card",
    billing_details: {
      address: billingDetails?.address ?? null,
      email: text("email"),
      name: text("name"),
      phone: text("phone"),
    },
    card: {
      brand: detectCardBrand(digits),
      country: "US",
      exp_month: expMonth,
      exp_year: expYear < 100 ? 2000 + expYear : expYear,
      funding: "credit",
      last4: digits.slice(-4),
    },
    created: nowInUnixSeconds(),
    customer: null,
    livemode: false,
    metadata: {},
  };
  engine.state.paymentMethods.set(method.id, method);
  engine.state.cardNumbers.set(method.id, digits);
  return method;
}

/** `pm_card_visa` and friends become a fresh PaymentMethod each time, as in test mode; other ids must exist. */
export function resolvePaymentMethodId({
  engine,
  id,
}: {
  engine: PaymentsEngine;
  id: string;
}): CardPaymentMethod {
  const tokenDigits = TEST_PAYMENT_METHOD_TOKENS[id];
  if (tokenDigits !== undefined) {
    const nextYear = new Date().getUTCFullYear() + 1;
    return storeCardPaymentMethod({ engine, digits: tokenDigits, expMonth: 12, expYear: nextYear });
  }
  const stored = engine.state.paymentMethods.get(id);
  if (!stored)
    throw resourceMissing({ kind: "payment_method", id, param: "payment_method", status: 400 });
  return stored;
}

/**
 * `payment_method_data[type]=card&payment_method_data[card][number]=…&[exp_month]&[exp_year]&[cvc]`,
 * the shape the browser script sends. Malformed details are a 402 card error before any charge.
 */
export function createPaymentMethodFromData({
  engine,
  data,
}: {
  engine: PaymentsEngine;
  data: FormObject;
}): CardPaymentMethod {
  if (data.type !== "card") {
    throw invalidRequest({
      message: "The local payments stand-in accepts only payment_method_data[type]=card.",
      param: "payment_method_data[type]",
    });
  }
  const card = data.card;
  if (typeof card !== "object" || Array.isArray(card)) {
    throw invalidRequest({
      message: "Missing required param: payment_method_data[card].",
      param: "payment_method_data[card]",
    });
  }
  const field = (key: string) => (typeof card[key] === "string" ? (card[key] as string) : "");
  const digits = normalizeCardNumber(field("number"));
  const expMonth = Number(field("exp_month"));
  const expYear = Number(field("exp_year"));
  const problem = findCardDetailsProblem({ number: digits, expMonth, expYear, cvc: field("cvc") });
  if (problem) {
    throw new StripeApiError({
      status: 402,
      body: {
        type: "card_error",
        code: problem.code,
        message: problem.message,
        param: problem.param,
      },
    });
  }
  const billing = data.billing_details;
  return storeCardPaymentMethod({
    engine,
    digits,
    expMonth,
    expYear,
    billingDetails: typeof billing === "object" && !Array.isArray(billing) ? billing : undefined,
  });
}
