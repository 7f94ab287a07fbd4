// Lengths are stored in decimal inches; people read them as shop fractions, with metric alongside.

// 1 in = 2.54 cm exactly (international yard and pound agreement, 1959).
export const CM_PER_INCH = 2.54;

// Shop fractions go to 1/16 in; 1/32 in is kept only for values exactly on it (groove depths are
// specified as 1/32 to 1/16 in), since showing 1/32 as "0.031" would read as a different size.
const FINEST = 32;
// A typed 0.8125 is 13/16 exactly; anything further than this from a 1/32 is not a shop fraction.
const FRACTION_TOLERANCE = 1e-6;

function greatestCommonDivisor(a: number, b: number): number {
  return b === 0 ? a : greatestCommonDivisor(b, a % b);
}

/** Whole inches and a reduced fraction of 32nds, e.g. 46/32 → "1 7/16". */
function formatThirtySeconds(parts: number): string {
  const whole = Math.floor(parts / FINEST);
  const rest = parts % FINEST;
  if (rest === 0) return String(whole);
  const divisor = greatestCommonDivisor(rest, FINEST);
  const fraction = `${rest / divisor}/${FINEST / divisor}`;
  return whole === 0 ? fraction : `${whole} ${fraction}`;
}

/**
 * "7/8 in (2.2 cm)". Values on a sixteenth (or exactly on a 1/32) show as a fraction; anything
 * else (0.74 typed by staff) shows as a decimal, because rounding 0.74 to "3/4" would hide
 * exactly the difference a boundary check turns on.
 */
export function formatInches(inches: number): string {
  if (!Number.isFinite(inches)) return "—";
  const sign = inches < 0 ? "−" : "";
  const size = Math.abs(inches);
  const parts = Math.round(size * FINEST);
  const onGrid = Math.abs(size * FINEST - parts) < FRACTION_TOLERANCE;
  const shown = onGrid ? formatThirtySeconds(parts) : String(Number(size.toFixed(3)));
  const cmShown = onGrid && parts === 0 ? "0" : (size * CM_PER_INCH).toFixed(1);
  return `${sign}${shown} in (${sign}${cmShown} cm)`;
}
