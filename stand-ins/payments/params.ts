import type { FormObject, FormValue } from "../shared/form-decode";
import { invalidRequest, missingParam, unknownParam } from "./errors";

/** Readers for form-encoded API parameters; each failure is the API's own 400 with `param` set. */

export type Params = FormObject;

export function rejectUnknownParams({
  params,
  allowed,
}: {
  params: Params;
  allowed: readonly string[];
}) {
  for (const key of Object.keys(params)) {
    if (!allowed.includes(key)) throw unknownParam(key);
  }
}

export function readOptionalString(params: Params, name: string): string | undefined {
  const value = params[name];
  if (value === undefined) return undefined;
  if (typeof value !== "string")
    throw invalidRequest({ message: `Invalid string: ${name}`, param: name });
  return value;
}

export function readRequiredString(params: Params, name: string): string {
  const value = readOptionalString(params, name);
  if (value === undefined || value === "") throw missingParam(name);
  return value;
}

export function readOptionalInteger(params: Params, name: string): number | undefined {
  const raw = readOptionalString(params, name);
  if (raw === undefined) return undefined;
  if (!/^-?\d+$/.test(raw))
    throw invalidRequest({ message: `Invalid integer: ${raw}`, param: name });
  const value = Number(raw);
  if (!Number.isSafeInteger(value))
    throw invalidRequest({ message: `Invalid integer: ${raw}`, param: name });
  return value;
}

export function readOptionalBoolean(params: Params, name: string): boolean | undefined {
  const raw = readOptionalString(params, name);
  if (raw === undefined) return undefined;
  if (raw === "true") return true;
  if (raw === "false") return false;
  throw invalidRequest({ message: `Invalid boolean: ${raw}`, param: name });
}

export function readOptionalObject(params: Params, name: string): FormObject | undefined {
  const value = params[name];
  if (value === undefined) return undefined;
  if (typeof value !== "object" || Array.isArray(value)) {
    throw invalidRequest({ message: `Invalid object`, param: name });
  }
  return value;
}

export function readStringList(params: Params, name: string): string[] | undefined {
  const value = params[name];
  if (value === undefined) return undefined;
  const list = Array.isArray(value) ? value : [value];
  return list.map((item) => {
    if (typeof item !== "string") throw invalidRequest({ message: `Invalid array`, param: name });
    return item;
  });
}

export function readOneOf<T extends string>(
  params: Params,
  name: string,
  choices: readonly T[],
): T | undefined {
  const raw = readOptionalString(params, name);
  if (raw === undefined) return undefined;
  if (!(choices as readonly string[]).includes(raw)) {
    throw invalidRequest({
      message: `Invalid ${name}: must be one of ${choices.join(", ")}`,
      param: name,
    });
  }
  return raw as T;
}

/**
 * Metadata rules: up to 50 keys, keys up to 40 characters, values up to 500 characters;
 * on update an empty value deletes a key and `metadata=""` clears them all.
 * Source: "Metadata", Stripe API reference (2024).
 */
export function mergeMetadata({
  current,
  params,
}: {
  current: Record<string, string>;
  params: Params;
}): Record<string, string> {
  const value: FormValue | undefined = params.metadata;
  if (value === undefined) return current;
  if (value === "") return {};
  if (typeof value === "string")
    throw invalidRequest({ message: "Invalid metadata", param: "metadata" });
  const entries = Array.isArray(value)
    ? value.map((item, index) => [String(index), item] as const)
    : Object.entries(value);
  const merged: Record<string, string> = { ...current };
  for (const [key, item] of entries) {
    if (typeof item !== "string") {
      throw invalidRequest({
        message: `Invalid value for metadata[${key}]: must be a string`,
        param: `metadata[${key}]`,
      });
    }
    if (key.length > 40) {
      throw invalidRequest({
        message: "Metadata keys can be at most 40 characters long.",
        param: `metadata[${key}]`,
      });
    }
    if (item.length > 500) {
      throw invalidRequest({
        message: "Metadata values can be at most 500 characters long.",
        param: `metadata[${key}]`,
      });
    }
    if (item === "") delete merged[key];
    else merged[key] = item;
  }
  if (Object.keys(merged).length > 50) {
    throw invalidRequest({ message: "Metadata can have at most 50 keys.", param: "metadata" });
  }
  return merged;
}

/** A lenient address check: the API refuses plainly malformed receipt addresses. Common practice, no source. */
export function readOptionalEmail(params: Params, name: string): string | null | undefined {
  const raw = readOptionalString(params, name);
  if (raw === undefined) return undefined;
  if (raw === "") return null;
  if (!/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(raw)) {
    throw invalidRequest({
      message: `Invalid email address: ${raw}`,
      param: name,
      code: "email_invalid",
    });
  }
  return raw;
}
