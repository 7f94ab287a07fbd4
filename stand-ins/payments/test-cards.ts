/**
 * Test cards and what the stand-in does with them.
 * Source: the payment provider's published test-mode card numbers and PaymentMethod tokens
 * ("Testing", Stripe documentation, 2024): 4242 4242 4242 4242 succeeds, 4000 0000 0000 0002 is a
 * generic decline, 4000 0000 0000 9995 declines for insufficient funds, 4000 0000 0000 0069 is an
 * expired card, 4000 0000 0000 0127 fails the CVC check; `pm_card_visa`, `pm_card_chargeDeclined…`.
 * Decline messages are the ones that documentation shows for each code.
 */

export type CardBrand = "visa" | "mastercard" | "amex" | "discover" | "unknown";

export type CardOutcome =
  { kind: "succeeds" } | { kind: "declines"; code: string; declineCode?: string; message: string };

export interface TestCard {
  number: string;
  brand: CardBrand;
  outcome: CardOutcome;
}

const SUCCEEDS: CardOutcome = { kind: "succeeds" };
const GENERIC_DECLINE: CardOutcome = {
  kind: "declines",
  code: "card_declined",
  declineCode: "generic_decline",
  message: "Your card was declined.",
};
const INSUFFICIENT_FUNDS: CardOutcome = {
  kind: "declines",
  code: "card_declined",
  declineCode: "insufficient_funds",
  message: "Your card has insufficient funds.",
};
const EXPIRED_CARD: CardOutcome = {
  kind: "declines",
  code: "expired_card",
  message: "Your card has expired.",
};
const INCORRECT_CVC: CardOutcome = {
  kind: "declines",
  code: "incorrect_cvc",
  message: "Your card's security code is incorrect.",
};
// Test mode refuses real card numbers; the provider answers with this decline code.
const LIVE_CARD_IN_TEST_MODE: CardOutcome = {
  kind: "declines",
  code: "card_declined",
  declineCode: "test_mode_live_card",
  message: "Your card was declined. Your request was in test mode, but used a non test card.",
};

export const TEST_CARDS: readonly TestCard[] = [
  { number: "4242424242424242", brand: "visa", outcome: SUCCEEDS },
  { number: "5555555555554444", brand: "mastercard", outcome: SUCCEEDS },
  { number: "4000000000000002", brand: "visa", outcome: GENERIC_DECLINE },
  { number: "4000000000009995", brand: "visa", outcome: INSUFFICIENT_FUNDS },
  { number: "4000000000000069", brand: "visa", outcome: EXPIRED_CARD },
  { number: "4000000000000127", brand: "visa", outcome: INCORRECT_CVC },
];

/** Magic PaymentMethod ids accepted in place of a real `pm_…` (same documentation page). */
export const TEST_PAYMENT_METHOD_TOKENS: Readonly<Record<string, string>> = {
  pm_card_visa: "4242424242424242",
  pm_card_mastercard: "5555555555554444",
  pm_card_chargeDeclined: "4000000000000002",
  pm_card_chargeDeclinedInsufficientFunds: "4000000000009995",
  pm_card_chargeDeclinedExpiredCard: "4000000000000069",
  pm_card_chargeDeclinedIncorrectCvc: "4000000000000127",
};

/**
 * Luhn (mod 10) check digit test.
 * Source: H. P. Luhn, "Computer for Verifying Numbers", U.S. Patent 2,950,048 (1960); ISO/IEC 7812-1 annex B.
 */
export function isLuhnValid(digits: string): boolean {
  if (!/^\d{2,19}$/.test(digits)) return false;
  let sum = 0;
  for (let i = 0; i < digits.length; i += 1) {
    const digit = Number(digits[digits.length - 1 - i]);
    const doubled = i % 2 === 1 ? digit * 2 : digit;
    sum += doubled > 9 ? doubled - 9 : doubled;
  }
  return sum % 10 === 0;
}

/** Brand from the leading digits (ISO/IEC 7812 issuer ranges as published by the card networks; common practice). */
export function detectCardBrand(digits: string): CardBrand {
  if (/^4/.test(digits)) return "visa";
  if (/^(5[1-5]|222[1-9]|22[3-9]\d|2[3-6]\d\d|27[01]\d|2720)/.test(digits)) return "mastercard";
  if (/^3[47]/.test(digits)) return "amex";
  if (/^(6011|65|64[4-9])/.test(digits)) return "discover";
  return "unknown";
}

/** Card numbers arrive with spaces or dashes from people; the API sees digits only. */
export function normalizeCardNumber(raw: string): string {
  return raw.replace(/[\s-]/g, "");
}

/** What happens when this card is charged: listed test cards per the table, any other valid number is a live card. */
export function resolveCardOutcome(digits: string): CardOutcome {
  return TEST_CARDS.find((card) => card.number === digits)?.outcome ?? LIVE_CARD_IN_TEST_MODE;
}

export type CardDetailsProblem = { code: string; param: string; message: string };

/**
 * Checks the details a card form sends before any charge is tried (number, expiry, CVC).
 * Expiry is valid through the last day of its month (card network practice, common practice, no source).
 */
export function findCardDetailsProblem({
  number,
  expMonth,
  expYear,
  cvc,
  now = new Date(),
}: {
  number: string;
  expMonth: number;
  expYear: number;
  cvc: string | undefined;
  now?: Date;
}): CardDetailsProblem | null {
  const digits = normalizeCardNumber(number);
  if (!/^\d{12,19}$/.test(digits) || !isLuhnValid(digits)) {
    return { code: "incorrect_number", param: "number", message: "Your card number is incorrect." };
  }
  if (!Number.isInteger(expMonth) || expMonth < 1 || expMonth > 12) {
    return {
      code: "invalid_expiry_month",
      param: "exp_month",
      message: "Your card's expiration month is invalid.",
    };
  }
  const fullYear = expYear < 100 ? 2000 + expYear : expYear;
  const currentYear = now.getUTCFullYear();
  if (!Number.isInteger(fullYear) || fullYear < currentYear || fullYear > currentYear + 50) {
    return {
      code: "invalid_expiry_year",
      param: "exp_year",
      message: "Your card's expiration year is invalid.",
    };
  }
  if (fullYear === currentYear && expMonth < now.getUTCMonth() + 1) {
    return {
      code: "invalid_expiry_month",
      param: "exp_month",
      message: "Your card's expiration date is in the past.",
    };
  }
  if (cvc !== undefined && !/^\d{3,4}$/.test(cvc)) {
    return { code: "invalid_cvc", param: "cvc", message: "Your card's security code is invalid." };
  }
  return null;
}
