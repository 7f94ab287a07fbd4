// What staff type into a length box, read as decimal inches. Builders and inspectors read tapes in
// shop fractions, so "3/4", "1 1/2", "1-1/2" and `22"` are accepted as well as decimals (common
// practice, no source). Pure: used by the forms as people type.

const DECIMAL = /^(\d+(?:\.\d*)?|\.\d+)$/;
const FRACTION = /^(?:(\d+)[\s-]+)?(\d+)\/(\d+)$/;
const UNIT = /\s*(?:"|''|in\.?|inch|inches)$/i;

/**
 * undefined for an empty box (the schema then asks for a value), NaN for text that is not a
 * length (the schema says it must be a number), otherwise the inches.
 */
export function parseInches(text: string): number | undefined {
  const trimmed = text.trim().replace(UNIT, "").trim();
  if (trimmed === "") return undefined;
  if (DECIMAL.test(trimmed)) return Number(trimmed);
  const match = FRACTION.exec(trimmed);
  if (!match) return Number.NaN;
  const whole = Number(match[1] ?? "0");
  const numerator = Number(match[2]);
  const denominator = Number(match[3]);
  if (denominator === 0) return Number.NaN;
  // "3/2" is a typing slip for "1 1/2" at best; a mixed number needs a proper fraction.
  if (match[1] !== undefined && numerator >= denominator) return Number.NaN;
  return whole + numerator / denominator;
}

// Shop fractions go to 1/16 in, and 1/32 for groove depths (as in lib/catalog/format-inches.ts).
const FINEST = 32;

/** The text a length box starts with: a shop fraction when the value sits on one, else the decimal. */
export function inchesForInput(inches: number | undefined): string {
  if (inches === undefined || !Number.isFinite(inches)) return "";
  const parts = Math.round(inches * FINEST);
  if (Math.abs(inches * FINEST - parts) > 1e-6 || inches < 0)
    return String(Number(inches.toFixed(4)));
  const whole = Math.floor(parts / FINEST);
  let rest = parts % FINEST;
  if (rest === 0) return String(whole);
  let denominator = FINEST;
  while (rest % 2 === 0) {
    rest /= 2;
    denominator /= 2;
  }
  return whole === 0 ? `${rest}/${denominator}` : `${whole} ${rest}/${denominator}`;
}

/** Whole numbers (chambers, counts): undefined when empty, NaN when not a whole number. */
export function parseWholeNumber(text: string): number | undefined {
  const trimmed = text
    .trim()
    .replace(/^\+/, "")
    .replace(/^[\u2212\u2013]/, "-");
  if (trimmed === "") return undefined;
  return /^-?\d+$/.test(trimmed) ? Number(trimmed) : Number.NaN;
}
