import { AppError, type ErrorCode, type FieldErrors } from "@/lib/http/errors";
import type { TransitionRefusal } from "./state-machine";

/** The state machine said no (lib/orders/state-machine.ts); `refusal` says which rule. */
export class TransitionRefused extends AppError {
  override name = "TransitionRefused";
  constructor(
    code: ErrorCode,
    message: string,
    readonly refusal: TransitionRefusal,
    fields?: FieldErrors,
  ) {
    super(code, message, fields);
  }
}

/** Someone else changed the order between our read and our write; nothing of ours was written. */
export class StaleOrderError extends AppError {
  override name = "StaleOrderError";
  constructor(message: string) {
    super("conflict", message);
  }
}

// How a refused transition reaches the client: the wrong role is a 403, a missing reason a 400
// on the reason field, and every "not from this state" a 409 conflict (the order moved on, or
// the screen offered something it should not have).
export function refusalError({ code, message }: { code: TransitionRefusal; message: string }): TransitionRefused {
  switch (code) {
    case "role_not_allowed":
      return new TransitionRefused("forbidden", message, code);
    case "reason_required":
      return new TransitionRefused("bad_request", message, code, { reason: message });
    case "unknown_state":
      return new TransitionRefused("bad_request", message, code, { to: message });
    default:
      return new TransitionRefused("conflict", message, code);
  }
}

/** The message the second of two volunteers sees when the first got there before them. */
export function staleVersionError(currentLabel: string): StaleOrderError {
  return new StaleOrderError(
    `Someone else updated this order while you had it open; it is now "${currentLabel}". Reload to see what changed.`,
  );
}
