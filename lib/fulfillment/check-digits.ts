// Check-digit arithmetic for carrier tracking numbers. Each function takes the characters before
// the check digit and returns the digit that should follow. Inputs are already normalized
// (uppercase, no spaces); callers check the shape first.

function digitsOf(body: string): number[] {
  if (!/^\d+$/.test(body)) throw new RangeError(`Expected digits only, got "${body}".`);
  return [...body].map(Number);
}

/**
 * Mod 10 with weights 3 and 1 from the right: the digit next to the check digit weighs 3.
 * Source: USPS Publication 199 (Intelligent Mail Package Barcode Implementation Guide), its
 * "Mod 10" check-digit appendix; the same sum is the GS1 check digit. FedEx Ground's 15-digit
 * numbers use it too (from the open dataset jkeen/tracking_number_data, couriers/fedex.json:
 * no FedEx publication checked).
 */
export function mod10Weight31CheckDigit(body: string): number {
  const digits = digitsOf(body).reverse();
  const sum = digits.reduce((total, digit, index) => total + digit * (index % 2 === 0 ? 3 : 1), 0);
  return (10 - (sum % 10)) % 10;
}

// UPS counts a letter as its alphabet position plus one, last digit only (A=2, B=3 … H=9, I=0,
// J=1 …): from memory, no UPS publication found; the same mapping, (char code − 3) mod 10, is in
// the open dataset jkeen/tracking_number_data, CHECKSUM_ALGORITHMS.md.
function upsValue(char: string): number {
  const code = char.charCodeAt(0);
  if (code >= 48 && code <= 57) return code - 48;
  if (code >= 65 && code <= 90) return (code - 63) % 10;
  throw new RangeError(`Not a UPS tracking character: "${char}".`);
}

/**
 * UPS "1Z" numbers: the 15 characters after "1Z" and before the check digit, odd positions
 * weight 1 and even positions weight 2, and the check digit brings the sum to a multiple of 10.
 * From memory, checked against the open dataset jkeen/tracking_number_data (couriers/ups.json,
 * mod10 with odds multiplier 2): UPS publishes no check-digit specification that we found.
 */
export function upsCheckDigit(body: string): number {
  const sum = [...body].reduce(
    (total, char, index) => total + upsValue(char) * (index % 2 === 0 ? 1 : 2),
    0,
  );
  return (10 - (sum % 10)) % 10;
}

const S10_WEIGHTS = [8, 6, 4, 2, 3, 5, 9, 7] as const;

/**
 * UPU S10 international item identifiers (2 letters, 8 digits, check digit, 2 letters): weights
 * 8,6,4,2,3,5,9,7 on the serial, C = 11 − (sum mod 11), 10 → 0, 11 → 5.
 * Source: UPU standard S10, as described in Wikipedia's "S10 (UPU standard)" article (worked
 * example: serial 47312482 → 9); we did not read the UPU text itself.
 */
export function s10CheckDigit(serial: string): number {
  const digits = digitsOf(serial);
  if (digits.length !== S10_WEIGHTS.length) throw new RangeError("An S10 serial has 8 digits.");
  const sum = digits.reduce((total, digit, index) => total + digit * (S10_WEIGHTS[index] ?? 0), 0);
  const check = 11 - (sum % 11);
  return check === 10 ? 0 : check === 11 ? 5 : check;
}

/**
 * FedEx Express 12-digit numbers: weights 1, 3, 7 repeating from the right, sum mod 11, and a
 * remainder of 10 reads as 0. From the open dataset jkeen/tracking_number_data (couriers/fedex.json,
 * weightings 3,1,7… from the left over 11 digits, modulo 11 then 10); no FedEx publication checked.
 */
export function fedexExpressCheckDigit(body: string): number {
  const weights = [1, 3, 7];
  const digits = digitsOf(body).reverse();
  const sum = digits.reduce((total, digit, index) => total + digit * (weights[index % 3] ?? 0), 0);
  return (sum % 11) % 10;
}
