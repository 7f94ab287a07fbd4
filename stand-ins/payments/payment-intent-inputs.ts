import type { ApiRequest, PaymentsEngine } from "./engine";
import { invalidRequest, resourceMissing } from "./errors";
import type { PaymentIntent, PaymentIntentStatus } from "./objects";
import { readOptionalObject, readOptionalString, readStringList } from "./params";

/** What the PaymentIntent routes accept and the look-ups they share. */

// Parameter names from PaymentIntentCreateParams / UpdateParams in the `stripe` SDK v23 types:
// known names are accepted (most are stored or ignored), anything else is the API's "unknown parameter".
export const CREATE_PARAMS = [
  "amount",
  "currency",
  "allowed_payment_method_types",
  "amount_details",
  "application_fee_amount",
  "automatic_payment_methods",
  "capture_method",
  "confirm",
  "confirmation_method",
  "customer",
  "description",
  "error_on_requires_action",
  "excluded_payment_method_types",
  "expand",
  "metadata",
  "off_session",
  "payment_method",
  "payment_method_data",
  "payment_method_options",
  "receipt_email",
  "return_url",
  "setup_future_usage",
  "shipping",
  "statement_descriptor",
  "statement_descriptor_suffix",
  "transfer_group",
  "use_stripe_sdk",
] as const;
export const UPDATE_PARAMS = [
  "amount",
  "currency",
  "allowed_payment_method_types",
  "customer",
  "description",
  "expand",
  "metadata",
  "payment_method",
  "payment_method_options",
  "receipt_email",
  "setup_future_usage",
  "shipping",
  "statement_descriptor",
  "statement_descriptor_suffix",
  "transfer_group",
] as const;
// Fields that may still change after the payment has succeeded or was canceled.
export const ALWAYS_UPDATABLE = ["metadata", "description", "receipt_email", "shipping", "expand"];
export const CANCELABLE: readonly PaymentIntentStatus[] = [
  "requires_payment_method",
  "requires_confirmation",
  "requires_action",
  "processing",
];

export function findIntent({ engine, id }: { engine: PaymentsEngine; id: string }): PaymentIntent {
  const intent = engine.state.intents.get(id);
  if (!intent) throw resourceMissing({ kind: "payment_intent", id, param: "intent" });
  return intent;
}

export function readCustomer(
  engine: PaymentsEngine,
  request: ApiRequest,
): string | null | undefined {
  const customer = readOptionalString(request.params, "customer");
  if (customer === undefined || customer === "") return customer === "" ? null : undefined;
  if (!engine.state.customers.has(customer)) {
    throw resourceMissing({ kind: "customer", id: customer, param: "customer", status: 400 });
  }
  return customer;
}

export function readPaymentMethodTypes(request: ApiRequest) {
  const allowed = readStringList(request.params, "allowed_payment_method_types");
  const automatic = readOptionalObject(request.params, "automatic_payment_methods");
  if (allowed && automatic) {
    throw invalidRequest({
      message:
        "You may only specify one of these parameters: automatic_payment_methods, allowed_payment_method_types.",
      param: "automatic_payment_methods",
    });
  }
  if (allowed && !allowed.includes("card")) {
    throw invalidRequest({
      message:
        "The local payments stand-in takes card payments only: include 'card' in allowed_payment_method_types.",
      param: "allowed_payment_method_types",
    });
  }
  if (allowed) return { allowed, automatic: null, types: ["card"] };
  return { allowed: null, automatic: { enabled: automatic?.enabled !== "false" }, types: ["card"] };
}
