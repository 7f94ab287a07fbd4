// Small builders for SVG markup strings. Every piece of text goes through escapeXml, because
// model names come from staff input and the drawing is inlined into pages and e-mails.

// XML 1.0 allows tab, newline, carriage return and U+0020 upward (minus surrogates and
// U+FFFE/U+FFFF); anything else makes the whole document unparseable (XML 1.0, §2.2).
const NOT_XML_CHAR =
  /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

export function escapeXml(text: string): string {
  return text
    .replace(NOT_XML_CHAR, "")
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&apos;");
}

const round = (n: number) => Math.round(n * 10) / 10;

type Attrs = Record<string, string | number | undefined>;

function attributes(attrs: Attrs): string {
  return Object.entries(attrs)
    .filter((entry): entry is [string, string | number] => entry[1] !== undefined)
    .map(
      ([key, value]) => `${key}="${typeof value === "number" ? round(value) : escapeXml(value)}"`,
    )
    .join(" ");
}

export const element = (name: string, attrs: Attrs, children = "") =>
  children === ""
    ? `<${name} ${attributes(attrs)}/>`
    : `<${name} ${attributes(attrs)}>${children}</${name}>`;

export const rect = (x: number, y: number, width: number, height: number, attrs: Attrs = {}) =>
  element("rect", { x, y, width: Math.max(0, width), height: Math.max(0, height), ...attrs });

export const line = (x1: number, y1: number, x2: number, y2: number, attrs: Attrs = {}) =>
  element("line", { x1, y1, x2, y2, ...attrs });

export const text = (x: number, y: number, content: string, attrs: Attrs = {}) =>
  element("text", { x, y, ...attrs }, escapeXml(content));

/** Cuts a label to `max` characters on a whole character (never inside a surrogate pair). */
export function shorten(label: string, max: number): string {
  const chars = Array.from(label);
  return chars.length <= max
    ? label
    : `${chars
        .slice(0, max - 1)
        .join("")
        .trimEnd()}…`;
}

/**
 * A short, stable id prefix so two drawings inlined on one page keep their own pattern ids.
 * 32-bit FNV-1a hash (Fowler, Noll & Vo; common practice): stable, not secret.
 */
export function idPrefix(seed: string): string {
  let hash = 2166136261;
  for (let i = 0; i < seed.length; i++) {
    hash ^= seed.charCodeAt(i);
    hash = Math.imul(hash, 16777619);
  }
  return `rw${(hash >>> 0).toString(36)}`;
}
