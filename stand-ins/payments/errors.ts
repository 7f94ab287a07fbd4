/**
 * Errors in the payments API's shape: `{ error: { type, code, message, param, … } }`.
 * The `stripe` SDK picks its error class from the HTTP status (400/404 → StripeInvalidRequestError,
 * 400 + type "idempotency_error" → StripeIdempotencyError, 401 → StripeAuthenticationError,
 * 402 → StripeCardError), see `generateV1Error` in the SDK's Error.js (v23, 2026).
 */

export type StripeErrorType =
  "api_error" | "card_error" | "idempotency_error" | "invalid_request_error";

export interface StripeErrorBody {
  type: StripeErrorType;
  message: string;
  code?: string;
  decline_code?: string;
  param?: string;
  charge?: string;
  payment_intent?: unknown;
  payment_method?: unknown;
}

export class StripeApiError extends Error {
  readonly status: number;
  readonly body: StripeErrorBody;

  constructor({ status, body }: { status: number; body: StripeErrorBody }) {
    super(body.message);
    this.status = status;
    this.body = body;
  }
}

export function invalidRequest({
  message,
  param,
  code,
  paymentIntent,
}: {
  message: string;
  param?: string;
  code?: string;
  paymentIntent?: unknown;
}): StripeApiError {
  return new StripeApiError({
    status: 400,
    body: {
      type: "invalid_request_error",
      message,
      ...(code ? { code } : {}),
      ...(param ? { param } : {}),
      ...(paymentIntent ? { payment_intent: paymentIntent } : {}),
    },
  });
}

export function missingParam(param: string): StripeApiError {
  return invalidRequest({
    message: `Missing required param: ${param}.`,
    param,
    code: "parameter_missing",
  });
}

export function unknownParam(param: string): StripeApiError {
  return invalidRequest({
    message: `Received unknown parameter: ${param}`,
    param,
    code: "parameter_unknown",
  });
}

/** `kind` is the API's object name (payment_intent, refund, customer…). */
export function resourceMissing({
  kind,
  id,
  param,
  status = 404,
}: {
  kind: string;
  id: string;
  param?: string;
  status?: 400 | 404;
}): StripeApiError {
  return new StripeApiError({
    status,
    body: {
      type: "invalid_request_error",
      code: "resource_missing",
      message: `No such ${kind}: '${id}'`,
      ...(param ? { param } : {}),
    },
  });
}

export function authenticationFailed(message: string): StripeApiError {
  return new StripeApiError({ status: 401, body: { type: "invalid_request_error", message } });
}

export function idempotencyConflict(key: string): StripeApiError {
  return new StripeApiError({
    status: 400,
    body: {
      type: "idempotency_error",
      message: `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`,
    },
  });
}
