import { AppError } from "@/lib/http/errors";
import type { TransitionRefusal } from "./states";

// How a refused transition reaches the client: the wrong role is a 403, a missing reason a 400
// on the reason field, and every "not from this state" a 409 conflict (the order moved on, or
// the screen offered something it should not have).
export function refusalError({ code, message }: { code: TransitionRefusal; message: string }): AppError {
  switch (code) {
    case "role_not_allowed":
      return new AppError("forbidden", message);
    case "reason_required":
      return new AppError("bad_request", message, { reason: message });
    case "unknown_state":
      return new AppError("bad_request", message, { to: message });
    default:
      return new AppError("conflict", message);
  }
}

/** The message the second of two volunteers sees when the first got there before them. */
export function staleVersionError(currentLabel: string): AppError {
  return new AppError(
    "conflict",
    `Someone else updated this order while you had it open; it is now "${currentLabel}". Reload to see what changed.`,
  );
}
