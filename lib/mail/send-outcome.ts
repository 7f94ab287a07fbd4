// How the sender reads an error the mail service answered with. Names and statuses: the
// "Errors" page of the Resend API reference (2025) and RESEND_ERROR_CODE_KEY in the SDK 6.38.

export type SendVerdict =
  /** Try again later with the same idempotency key. */
  | "retry"
  /** No retry will help (the message itself is malformed): stop and show it to an admin. */
  | "give-up"
  /** The key was already used for an earlier, accepted attempt of this same message. */
  | "already-sent";

const GIVE_UP = new Set([
  "validation_error",
  "missing_required_field",
  "invalid_from_address",
  "invalid_attachment",
  "invalid_parameter",
  "invalid_idempotency_key",
]);

export function classifySendError({
  name,
  statusCode,
}: {
  name: string;
  statusCode: number | null;
}): SendVerdict {
  // 409 invalid_idempotent_request: this key was accepted before with another body (the message
  // was re-rendered after a data change); the first one went out, so this one must not.
  if (name === "invalid_idempotent_request") return "already-sent";
  if (GIVE_UP.has(name)) return "give-up";
  // Everything else (network failure with no status, 429 limits and quotas, 5xx, a key or
  // domain set up wrong) can be fixed without touching the message: keep it and retry.
  return statusCode === 400 || statusCode === 422 ? "give-up" : "retry";
}
