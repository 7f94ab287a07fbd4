// The store's rules for raw text arriving from outside, before any schema or query sees it.
// Pure functions (no framework imports) so the rules are tested directly and shared by the
// request gate (routes, the auth route, the webhook) and the server-action wrapper.
//
// Sources: PostgreSQL refuses U+0000 in text ("invalid byte sequence for encoding UTF8: 0x00",
// PostgreSQL 16 documentation, section 8.3 Character Types); the C0 control characters are
// U+0000–U+001F and U+007F is DEL (The Unicode Standard 15.0, chapter 23.1, 2022); percent-
// decoding of a malformed sequence throws URIError (ECMAScript 2024, section 19.2.6.1); the
// prototype keys are those that let a parsed object reach Object.prototype (common practice,
// no source).

/** Field names whose text is written on several lines (a note, a reason, a description). */
export const MULTI_LINE_FIELDS: ReadonlySet<string> = new Set([
  "note",
  "notes",
  "reason",
  "description",
  "message",
  "comment",
  "instructions",
  "tributeMessage",
]);

export const PROTOTYPE_KEYS: ReadonlySet<string> = new Set(["__proto__", "constructor", "prototype"]);

/** Deeper than this a JSON body is refused: no form of ours nests more than a few levels. */
export const MAX_DEPTH = 32;

export type InputProblem = { field: string; message: string };

// Every C0 control character and DEL; tab, line feed and carriage return are told apart below.
const CONTROL = /[\u0000-\u001f\u007f]/;
const CONTROL_EXCEPT_LINES = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/;
// Lone surrogates cannot be stored as UTF-8 either.
const LONE_SURROGATE = /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;

/** A problem with one piece of text, or null; `multiLine` lets tab, LF and CR through. */
export function textProblem(value: string, field: string, multiLine = false): InputProblem | null {
  const pattern = multiLine ? CONTROL_EXCEPT_LINES : CONTROL;
  if (value.includes("\u0000"))
    return { field, message: `${field} contains a NUL character, which is not allowed.` };
  if (pattern.test(value))
    return { field, message: `${field} contains a control character, which is not allowed.` };
  if (LONE_SURROGATE.test(value))
    return { field, message: `${field} contains a broken character (a lone surrogate).` };
  return null;
}

function isMultiLine(path: string[]): boolean {
  const last = path[path.length - 1];
  return last !== undefined && MULTI_LINE_FIELDS.has(last);
}

/**
 * Walks a parsed JSON value (or a server action's input) and returns the first problem: a key
 * that reaches the prototype, a control character in a key or a text, or nesting too deep.
 */
export function valueProblem(value: unknown, path: string[] = [], depth = 0): InputProblem | null {
  const field = path.length > 0 ? path.join(".") : "body";
  if (typeof value === "string") return textProblem(value, field, isMultiLine(path));
  if (value === null || typeof value !== "object") return null;
  if (depth > MAX_DEPTH) return { field, message: "The request is nested too deeply." };
  if (value instanceof Date || value instanceof Blob) return null;
  if (typeof FormData !== "undefined" && value instanceof FormData) {
    for (const [key, entry] of value.entries()) {
      const problem = keyProblem(key, path) ?? (typeof entry === "string" ? valueProblem(entry, [...path, key], depth + 1) : fileNameProblem(entry, [...path, key]));
      if (problem) return problem;
    }
    return null;
  }
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const problem = valueProblem(value[i], [...path, String(i)], depth + 1);
      if (problem) return problem;
    }
    return null;
  }
  for (const key of Object.keys(value)) {
    const problem = keyProblem(key, path) ?? valueProblem((value as Record<string, unknown>)[key], [...path, key], depth + 1);
    if (problem) return problem;
  }
  return null;
}

/** A key that reaches the prototype or carries a control character. */
export function keyProblem(key: string, path: string[]): InputProblem | null {
  const field = [...path, key].join(".");
  if (PROTOTYPE_KEYS.has(key)) return { field, message: `The field name "${key}" is not allowed.` };
  return textProblem(key, field);
}

function fileNameProblem(entry: unknown, path: string[]): InputProblem | null {
  const name = (entry as { name?: unknown } | null)?.name;
  return typeof name === "string" ? textProblem(name, path.join(".")) : null;
}

/** Decodes one path segment; malformed percent-encoding is a problem, not a throw. */
export function decodeSegment(raw: string): { ok: true; value: string } | { ok: false } {
  try {
    return { ok: true, value: decodeURIComponent(raw) };
  } catch {
    return { ok: false };
  }
}

/** Problems of a URL: each path segment (decoded safely) and each query key and value. */
export function urlProblem(url: URL): InputProblem | null {
  for (const raw of url.pathname.split("/")) {
    const decoded = decodeSegment(raw);
    if (!decoded.ok) return { field: "path", message: "The address has a malformed percent-encoding." };
    const problem = textProblem(decoded.value, "path");
    if (problem) return problem;
  }
  // URLSearchParams leaves a malformed sequence as it is; the raw query is checked for it too.
  for (const part of url.search.replace(/^\?/, "").split("&")) {
    if (part === "") continue;
    const decoded = decodeSegment(part.replace(/\+/g, " "));
    if (!decoded.ok) return { field: "query", message: "The query string has a malformed percent-encoding." };
  }
  for (const [key, value] of url.searchParams.entries()) {
    const problem = keyProblem(key, ["query"]) ?? textProblem(value, key);
    if (problem) return problem;
  }
  return null;
}

/** Problems of route parameters as the framework hands them over (strings or string lists). */
export function paramsProblem(params: unknown): InputProblem | null {
  if (params === null || typeof params !== "object") return null;
  for (const [key, value] of Object.entries(params)) {
    const values = Array.isArray(value) ? value : [value];
    for (const v of values) {
      if (typeof v !== "string") continue;
      const problem = textProblem(v, key);
      if (problem) return problem;
    }
  }
  return null;
}

/** Header values may carry tab but no other control character (RFC 9110, section 5.5, 2022). */
export function headerProblem(name: string, value: string): InputProblem | null {
  if (/[\u0000-\u0008\u000a-\u001f\u007f]/.test(value))
    return { field: `header ${name}`, message: `The ${name} header contains a control character.` };
  return null;
}
