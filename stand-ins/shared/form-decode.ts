/**
 * Decodes application/x-www-form-urlencoded bodies written with bracket notation
 * (`metadata[orderId]=7`, `expand[0]=latest_charge`, `expand[]=customer`,
 * `payment_method_data[card][number]=4242…`) into nested values.
 * Source: the encoding used by the `stripe` Node SDK (`stringifyRequestData` in its utils, v23, 2026)
 * and by the browser library; the "rack"/"qs" bracket convention it follows. Common practice, no formal spec.
 */

export type FormValue = string | FormValue[] | FormObject;
export interface FormObject {
  [key: string]: FormValue;
}

// Keys that would let a request body reach Object.prototype.
const FORBIDDEN_KEYS = new Set(["__proto__", "prototype", "constructor"]);

/** Splits `a[b][0][]` into ["a", "b", "0", ""]; a key with unbalanced brackets stays whole. */
export function splitBracketKey(key: string): string[] {
  const open = key.indexOf("[");
  if (open <= 0 || !key.endsWith("]")) return [key];
  const segments = [key.slice(0, open)];
  const rest = key.slice(open);
  const pattern = /\[([^[\]]*)\]/g;
  let consumed = 0;
  for (const match of rest.matchAll(pattern)) {
    if (match.index !== consumed) return [key];
    segments.push(match[1] ?? "");
    consumed += match[0].length;
  }
  return consumed === rest.length ? segments : [key];
}

export function decodeForm(body: string): FormObject {
  const root: FormObject = {};
  for (const [rawKey, value] of new URLSearchParams(body)) {
    const segments = splitBracketKey(rawKey);
    if (segments.some((segment) => FORBIDDEN_KEYS.has(segment))) continue;
    assignPath({ target: root, segments, value });
  }
  return normalizeArrays(root) as FormObject;
}

function assignPath({
  target,
  segments,
  value,
}: {
  target: FormObject;
  segments: string[];
  value: string;
}) {
  let node = target;
  segments.forEach((segment, index) => {
    const isLast = index === segments.length - 1;
    // `[]` appends: give it the next free numeric slot so normalizeArrays orders it.
    const key = segment === "" ? String(Object.keys(node).length) : segment;
    if (isLast) {
      node[key] = value;
      return;
    }
    const existing = node[key];
    if (typeof existing === "object" && !Array.isArray(existing)) {
      node = existing;
    } else {
      const child: FormObject = {};
      node[key] = child;
      node = child;
    }
  });
}

/** Objects whose keys are exactly 0..n-1 become arrays, as the encoder produced them from arrays. */
function normalizeArrays(value: FormValue): FormValue {
  if (typeof value === "string" || Array.isArray(value)) return value;
  const keys = Object.keys(value);
  const normalized: FormObject = {};
  for (const key of keys) {
    const child = value[key];
    if (child !== undefined) normalized[key] = normalizeArrays(child);
  }
  const isIndexed =
    keys.length > 0 &&
    keys.every((key) => /^\d+$/.test(key)) &&
    keys.every((_, i) => i.toString() in value);
  if (!isIndexed) return normalized;
  return keys
    .map(Number)
    .sort((a, b) => a - b)
    .map((index) => normalized[String(index)] ?? "");
}
