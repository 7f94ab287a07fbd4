import type { ZodError } from "zod";

export type ErrorCode =
  | "bad_request"
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "out_of_stock"
  | "payment_failed"
  | "too_many_requests"
  | "unavailable"
  | "internal";

const STATUS: Record<ErrorCode, number> = {
  bad_request: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  out_of_stock: 409,
  payment_failed: 402,
  too_many_requests: 429,
  unavailable: 503,
  internal: 500,
};

export type FieldErrors = Record<string, string>;

/** The one error type of the store; it becomes `{ error: { code, message, fields? } }`. */
export class AppError extends Error {
  override name = "AppError";
  readonly status: number;
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: FieldErrors,
  ) {
    super(message);
    this.status = STATUS[code];
  }
}

export function fieldErrorsFromZod(error: ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.join(".") : "_";
    fields[key] ??= issue.message;
  }
  return fields;
}

export function badInput(error: ZodError): AppError {
  const fields = fieldErrorsFromZod(error);
  const [first] = Object.entries(fields);
  const message = first ? (first[0] === "_" ? first[1] : `${first[0]}: ${first[1]}`) : "The request is not valid.";
  return new AppError("bad_request", message, fields);
}

export type ErrorBody = { error: { code: ErrorCode; message: string; fields?: FieldErrors } };

/** Turns anything thrown into a safe body; unknown errors are logged and never shown raw. */
export function toErrorBody(error: unknown): { status: number; body: ErrorBody } {
  if (error instanceof AppError) {
    const body: ErrorBody = { error: { code: error.code, message: error.message } };
    if (error.fields) body.error.fields = error.fields;
    return { status: error.status, body };
  }
  console.error(error);
  return {
    status: 500,
    body: { error: { code: "internal", message: "Something went wrong on our side. Please try again." } },
  };
}
