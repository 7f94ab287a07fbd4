import { z } from "zod";

// Numbers that arrive as text (a query string, a form field): plain decimal digits only, so
// "0x10", "1e3", "0b1", " 16 " or "Infinity" are refused instead of silently becoming numbers
// the way Number() and z.coerce.number() read them (ECMAScript 2024, section 7.1.4.1.1
// StringToNumber accepts hex, binary, octal, exponents and surrounding white space).

const INTEGER = /^-?\d{1,15}$/;
const DECIMAL = /^-?\d{1,15}(\.\d{1,15})?$/;

/** Text → number when it is written in decimal digits; anything else reaches the inner schema as is. */
export function decimalText(value: unknown, allowFraction: boolean): unknown {
  if (value === null || value === "") return undefined;
  if (typeof value !== "string") return value;
  return (allowFraction ? DECIMAL : INTEGER).test(value) ? Number(value) : value;
}

/** A whole number from a query string or form field: `queryInt(z.number().int().min(1))`. */
export function queryInt<T extends z.ZodType>(inner: T) {
  return z.preprocess((value) => decimalText(value, false), inner);
}

/** A decimal number from a query string or form field ("72", "22.5", "-4"). */
export function queryDecimal<T extends z.ZodType>(inner: T) {
  return z.preprocess((value) => decimalText(value, true), inner);
}
