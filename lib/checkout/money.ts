// Money is integer cents everywhere: floats cannot hold 0.10 exactly, and a sum of float dollars
// drifts by fractions of a cent that then show up on receipts. Dollars appear only at the edges:
// formatting for people and parsing what people type.

/** True for a whole number of cents that JavaScript can add without losing precision. */
export function isCents(value: unknown): value is number {
  return typeof value === "number" && Number.isSafeInteger(value);
}

function groupThousands(digits: string): string {
  // Common practice, no source: en-US groups by three with commas ("1,234,567").
  return digits.replace(/\B(?=(\d{3})+(?!\d))/g, ",");
}

/**
 * "$1,234.50" from 123450. Negative amounts (refunds) read "-$5.00", the same as
 * Intl.NumberFormat("en-US", { style: "currency", currency: "USD" }); the tests hold us to it.
 * Done with integer arithmetic rather than Intl so no float ever touches the amount.
 */
export function formatUsd(cents: number): string {
  if (!isCents(cents))
    throw new RangeError(`formatUsd needs a whole number of cents, got ${cents}.`);
  const sign = cents < 0 ? "-" : "";
  const absolute = Math.abs(cents);
  const dollars = Math.floor(absolute / 100);
  const rest = absolute % 100;
  return `${sign}$${groupThousands(String(dollars))}.${String(rest).padStart(2, "0")}`;
}

/** "$25" for whole dollars, "$25.50" otherwise: for prices in running text and buttons. */
export function formatUsdShort(cents: number): string {
  const full = formatUsd(cents);
  return cents % 100 === 0 ? full.slice(0, -3) : full;
}

export type ParsedUsd = { ok: true; cents: number } | { ok: false; message: string };

// Accepts what people type into a money box: "$1,234.50", "1234.5", "25", " 25.00 ".
// Commas must sit in proper groups of three so "1,23" (a European decimal comma) is refused
// rather than read as 123 dollars.
const USD_PATTERN = /^\$?\s*((?:\d{1,3}(?:,\d{3})+)|\d+)?(?:\.(\d{0,2}))?$/;

/** Parses a typed dollar amount into cents without any float arithmetic. Negative amounts are refused. */
export function parseUsd(text: string): ParsedUsd {
  const trimmed = text.trim();
  if (trimmed === "")
    return { ok: false, message: "Enter an amount in dollars, like 25 or 25.50." };
  if (trimmed.startsWith("-")) return { ok: false, message: "The amount can't be negative." };
  const match = USD_PATTERN.exec(trimmed);
  const whole = match?.[1];
  const fraction = match?.[2];
  if (!match || (whole === undefined && !fraction)) {
    if (/\.\d{3,}$/.test(trimmed)) {
      return { ok: false, message: "Use at most two digits after the decimal point (cents)." };
    }
    return { ok: false, message: "Enter an amount in dollars, like 25 or 1,250.50." };
  }
  const dollars = Number((whole ?? "0").replaceAll(",", ""));
  const cents = dollars * 100 + Number((fraction ?? "").padEnd(2, "0"));
  if (!Number.isSafeInteger(cents)) return { ok: false, message: "That amount is too large." };
  return { ok: true, cents };
}

/**
 * Cents from a dollar figure held in a number (a JSON body, a spreadsheet import). Rounds to the
 * nearest cent through the decimal string, so 1.005 becomes 101 cents, not the 100 that
 * Math.round(1.005 * 100) gives.
 */
export function centsFromDollars(dollars: number): number {
  if (!Number.isFinite(dollars)) throw new RangeError(`Not a dollar amount: ${dollars}.`);
  const cents = Math.round(Number(`${Math.abs(dollars).toFixed(8)}e2`));
  if (!Number.isSafeInteger(cents)) throw new RangeError(`Dollar amount too large: ${dollars}.`);
  return dollars < 0 && cents !== 0 ? -cents : cents;
}

/** Adds cents and refuses anything that is not whole cents, so a stray float fails loudly. */
export function sumCents(amounts: readonly number[]): number {
  let total = 0;
  for (const amount of amounts) {
    if (!isCents(amount)) throw new RangeError(`Not a whole number of cents: ${amount}.`);
    total += amount;
  }
  if (!Number.isSafeInteger(total)) throw new RangeError("The total is too large to add exactly.");
  return total;
}

/**
 * A percentage of an amount, in basis points (725 = 7.25%), rounded half up to the cent.
 * Half-up on the exact integer product: common practice for U.S. sales tax, no single source
 * (states that set a rule, such as bracket or "round half up", agree on the half-cent case).
 */
export function percentOfCents({
  cents,
  basisPoints,
}: {
  cents: number;
  basisPoints: number;
}): number {
  if (!isCents(cents) || cents < 0)
    throw new RangeError(`Not a non-negative amount of cents: ${cents}.`);
  if (!Number.isSafeInteger(basisPoints) || basisPoints < 0) {
    throw new RangeError(`Not a non-negative whole number of basis points: ${basisPoints}.`);
  }
  const product = cents * basisPoints;
  if (!Number.isSafeInteger(product))
    throw new RangeError("The amount is too large to tax exactly.");
  return Math.floor((product + 5_000) / 10_000);
}
