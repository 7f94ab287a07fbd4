import { createPrefixedId, nowInUnixSeconds } from "../shared/ids";
import { assertChargeableAmount, normalizeCurrency } from "./amounts";
import { confirmIntent } from "./confirm-intent";
import type { RouteHandler } from "./engine";
import { invalidRequest } from "./errors";
import type { PaymentIntent } from "./objects";
import {
  ALWAYS_UPDATABLE,
  CANCELABLE,
  CREATE_PARAMS,
  UPDATE_PARAMS,
  findIntent,
  readCustomer,
  readPaymentMethodTypes,
} from "./payment-intent-inputs";
import {
  mergeMetadata,
  readOneOf,
  readOptionalBoolean,
  readOptionalEmail,
  readOptionalInteger,
  readOptionalString,
  readRequiredString,
  rejectUnknownParams,
} from "./params";
import { resolvePaymentMethodId } from "./payment-methods";
import { presentIntent } from "./present";

export const createIntent: RouteHandler = ({ engine, request }) => {
  const { params } = request;
  rejectUnknownParams({ params, allowed: CREATE_PARAMS });
  const amount = readOptionalInteger(params, "amount");
  if (amount === undefined)
    throw invalidRequest({
      message: "Missing required param: amount.",
      param: "amount",
      code: "parameter_missing",
    });
  const currency = normalizeCurrency(readRequiredString(params, "currency"));
  assertChargeableAmount({ amount, currency });
  readOneOf(params, "capture_method", ["automatic", "automatic_async"] as const);
  const methods = readPaymentMethodTypes(request);
  const paymentMethodId = readOptionalString(params, "payment_method");
  const paymentMethod = paymentMethodId
    ? resolvePaymentMethodId({ engine, id: paymentMethodId })
    : null;
  const id = createPrefixedId({ prefix: "pi" });
  const intent: PaymentIntent = {
    id,
    object: "payment_intent",
    amount,
    amount_capturable: 0,
    amount_received: 0,
    allowed_payment_method_types: methods.allowed,
    automatic_payment_methods: methods.automatic,
    canceled_at: null,
    cancellation_reason: null,
    capture_method: "automatic_async",
    client_secret: `${id}_secret_${createPrefixedId({ prefix: "x" }).slice(2)}`,
    confirmation_method: "automatic",
    created: nowInUnixSeconds(),
    currency,
    customer: readCustomer(engine, request) ?? null,
    description: readOptionalString(params, "description") ?? null,
    last_payment_error: null,
    latest_charge: null,
    livemode: false,
    metadata: mergeMetadata({ current: {}, params }),
    next_action: null,
    payment_method: paymentMethod?.id ?? null,
    payment_method_types: methods.types,
    processing: null,
    receipt_email: readOptionalEmail(params, "receipt_email") ?? null,
    setup_future_usage:
      readOneOf(params, "setup_future_usage", ["off_session", "on_session"] as const) ?? null,
    shipping: params.shipping ?? null,
    statement_descriptor: readOptionalString(params, "statement_descriptor") ?? null,
    statement_descriptor_suffix: readOptionalString(params, "statement_descriptor_suffix") ?? null,
    status: paymentMethod ? "requires_confirmation" : "requires_payment_method",
    transfer_group: readOptionalString(params, "transfer_group") ?? null,
  };
  engine.state.intents.set(id, intent);
  if (readOptionalBoolean(params, "confirm") === true) {
    // Only what confirm itself reads: the rest was applied above.
    const confirmParams = Object.fromEntries(
      Object.entries(params).filter(([key]) =>
        ["expand", "payment_method_data", "return_url"].includes(key),
      ),
    );
    return confirmIntent({ engine, request: { ...request, params: confirmParams }, intent });
  }
  return { status: 200, body: presentIntent({ engine, intent, request }) };
};

export const retrieveIntent: RouteHandler = ({ engine, request, id }) => {
  const intent = findIntent({ engine, id });
  if (
    request.auth.kind === "publishable" &&
    readOptionalString(request.params, "client_secret") !== intent.client_secret
  ) {
    throw invalidRequest({
      message:
        "The client_secret provided does not match the client_secret associated with the PaymentIntent.",
      param: "client_secret",
    });
  }
  return { status: 200, body: presentIntent({ engine, intent, request }) };
};

export const updateIntent: RouteHandler = ({ engine, request, id }) => {
  const { params } = request;
  rejectUnknownParams({ params, allowed: UPDATE_PARAMS });
  const intent = findIntent({ engine, id });
  const locked = intent.status === "succeeded" || intent.status === "canceled";
  const lockedParam = Object.keys(params).find((key) => !ALWAYS_UPDATABLE.includes(key));
  if (locked && lockedParam) {
    throw invalidRequest({
      message: `You cannot update ${lockedParam} on a PaymentIntent with a status of ${intent.status}.`,
      param: lockedParam,
      code: "payment_intent_unexpected_state",
    });
  }
  // Read and check everything first, so a rejected update changes nothing.
  const currency =
    params.currency === undefined
      ? intent.currency
      : normalizeCurrency(readRequiredString(params, "currency"));
  const amount = readOptionalInteger(params, "amount") ?? intent.amount;
  assertChargeableAmount({ amount, currency });
  const metadata = mergeMetadata({ current: intent.metadata, params });
  const customer = readCustomer(engine, request);
  const description = readOptionalString(params, "description");
  const receiptEmail = readOptionalEmail(params, "receipt_email");
  const paymentMethodId = readOptionalString(params, "payment_method");
  const paymentMethod = paymentMethodId
    ? resolvePaymentMethodId({ engine, id: paymentMethodId })
    : undefined;

  intent.amount = amount;
  intent.currency = currency;
  intent.metadata = metadata;
  if (customer !== undefined) intent.customer = customer;
  if (description !== undefined) intent.description = description === "" ? null : description;
  if (receiptEmail !== undefined) intent.receipt_email = receiptEmail;
  if (params.shipping !== undefined)
    intent.shipping = params.shipping === "" ? null : params.shipping;
  if (paymentMethod) {
    intent.payment_method = paymentMethod.id;
    if (intent.status === "requires_payment_method") intent.status = "requires_confirmation";
  }
  return { status: 200, body: presentIntent({ engine, intent, request }) };
};

export const cancelIntent: RouteHandler = ({ engine, request, id }) => {
  rejectUnknownParams({ params: request.params, allowed: ["cancellation_reason", "expand"] });
  const intent = findIntent({ engine, id });
  const reason = readOneOf(request.params, "cancellation_reason", [
    "duplicate",
    "fraudulent",
    "requested_by_customer",
    "abandoned",
  ] as const);
  if (!CANCELABLE.includes(intent.status)) {
    throw invalidRequest({
      message: `You cannot cancel this PaymentIntent because it has a status of ${intent.status}. Only a PaymentIntent with one of the following statuses may be canceled: ${CANCELABLE.join(", ")}.`,
      code: "payment_intent_unexpected_state",
      paymentIntent: presentIntent({ engine, intent, request }),
    });
  }
  intent.status = "canceled";
  intent.canceled_at = nowInUnixSeconds();
  intent.cancellation_reason = reason ?? null;
  engine.emitEvent({ type: "payment_intent.canceled", object: intent, request });
  return { status: 200, body: presentIntent({ engine, intent, request }) };
};
