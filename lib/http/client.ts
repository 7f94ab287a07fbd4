// The browser's one way to call the store's JSON routes. Every error comes back as ApiError,
// whether the route answered with the store's error shape `{ error: { code, message, fields? } }`
// (lib/http/errors.ts), a proxy answered with an HTML 502, or the network was down, so forms and
// toasts read `error.message` and `error.fields` and never parse a response by hand.
// Safe in the browser: no server-only imports.
import type { FieldValues, Path, UseFormSetError } from "react-hook-form";

export type FieldErrors = Record<string, string>;

export class ApiError extends Error {
  override name = "ApiError";
  constructor(
    /** The HTTP status, or 0 when no answer came (offline, refused, DNS). */
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: FieldErrors,
  ) {
    super(message);
  }
}

export const OFFLINE_MESSAGE = "The store could not be reached. Check your connection and try again.";
export const DEFAULT_FAILURE_MESSAGE = "That did not work; please try again.";

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

function isFieldErrors(value: unknown): value is FieldErrors {
  return typeof value === "object" && value !== null && Object.values(value).every((v) => typeof v === "string");
}

/** The store's error shape in a parsed body, or null when the body is something else. */
export function errorFromBody(status: number, body: unknown): ApiError | null {
  if (typeof body !== "object" || body === null || !("error" in body)) return null;
  const error = (body as { error: unknown }).error;
  if (typeof error !== "object" || error === null) return null;
  const { code, message, fields } = error as { code?: unknown; message?: unknown; fields?: unknown };
  if (typeof message !== "string" || message === "") return null;
  return new ApiError(status, typeof code === "string" ? code : "internal", message, isFieldErrors(fields) ? fields : undefined);
}

function parseBody(text: string): unknown {
  if (text === "") return null;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

export type FetchJsonInit = Omit<RequestInit, "body"> & {
  /** Sent as a JSON body (with its content type); POST unless `method` says otherwise. */
  json?: unknown;
  body?: BodyInit | null;
  /** The message when the answer carries none of its own (a proxy's page, an empty body). */
  fallbackMessage?: string;
  /** The message when no answer came at all. */
  offlineMessage?: string;
};

/**
 * Calls a store route and returns its JSON as T. Throws ApiError on any failure; an aborted
 * request rethrows the AbortError so callers that cancel can tell it apart.
 */
export async function fetchJson<T>(url: string, init: FetchJsonInit = {}): Promise<T> {
  const { json, fallbackMessage = DEFAULT_FAILURE_MESSAGE, offlineMessage = OFFLINE_MESSAGE, headers, ...rest } = init;
  const request: RequestInit =
    json === undefined
      ? { ...rest, headers }
      : { method: "POST", ...rest, headers: { "content-type": "application/json", ...headers }, body: JSON.stringify(json) };
  let response: Response;
  try {
    response = await fetch(url, request);
  } catch (error) {
    if ((error as Error)?.name === "AbortError") throw error;
    throw new ApiError(0, "network", offlineMessage);
  }
  let text: string;
  try {
    text = await response.text();
  } catch (error) {
    if ((error as Error)?.name === "AbortError") throw error;
    throw new ApiError(response.status, "network", offlineMessage);
  }
  const body = parseBody(text);
  if (!response.ok) {
    throw errorFromBody(response.status, body) ?? new ApiError(response.status, response.status >= 500 ? "unavailable" : "internal", fallbackMessage);
  }
  if (body === undefined) throw new ApiError(response.status, "internal", fallbackMessage);
  return body as T;
}

/**
 * Puts each of the error's field messages beside its field in a react-hook-form form. Returns
 * true when at least one field got a message (so the caller can skip a general alert).
 */
export function applyFieldErrors<T extends FieldValues>(
  error: { fields?: FieldErrors } | null | undefined,
  setError: UseFormSetError<T>,
  { only }: { only?: readonly Path<T>[] } = {},
): boolean {
  let applied = false;
  for (const [field, message] of Object.entries(error?.fields ?? {})) {
    if (only && !only.includes(field as Path<T>)) continue;
    setError(field as Path<T>, { type: "server", message });
    applied = true;
  }
  return applied;
}
