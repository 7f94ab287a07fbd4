import { invalidRequest } from "./errors";

/**
 * Minimum charge per currency, in the smallest unit (cents, pence).
 * Source: "Minimum and maximum charge amounts", Stripe documentation (2024): USD/CAD/EUR/AUD 0.50,
 * GBP 0.30; the largest amount is 99,999,999 in the smallest unit for these currencies.
 * Only the currencies a U.S. store could plausibly take are listed; others are refused.
 */
export const MINIMUM_CHARGE_AMOUNTS: Readonly<Record<string, number>> = {
  usd: 50,
  cad: 50,
  eur: 50,
  aud: 50,
  gbp: 30,
};

export const MAXIMUM_CHARGE_AMOUNT = 99_999_999;

export function formatMinorAmount({
  amount,
  currency,
}: {
  amount: number;
  currency: string;
}): string {
  return new Intl.NumberFormat("en-US", {
    style: "currency",
    currency: currency.toUpperCase(),
  }).format(amount / 100);
}

export function normalizeCurrency(raw: string): string {
  const currency = raw.toLowerCase();
  if (MINIMUM_CHARGE_AMOUNTS[currency] === undefined) {
    throw invalidRequest({
      message: `Invalid currency: ${raw}. The local payments stand-in supports ${Object.keys(MINIMUM_CHARGE_AMOUNTS).join(", ")}.`,
      param: "currency",
    });
  }
  return currency;
}

export function assertChargeableAmount({
  amount,
  currency,
}: {
  amount: number;
  currency: string;
}): void {
  const minimum = MINIMUM_CHARGE_AMOUNTS[currency] ?? 50;
  if (amount < minimum) {
    throw invalidRequest({
      message: `Amount must be at least ${formatMinorAmount({ amount: minimum, currency })} ${currency}`,
      param: "amount",
      code: "amount_too_small",
    });
  }
  if (amount > MAXIMUM_CHARGE_AMOUNT) {
    throw invalidRequest({
      message: `Amount must be no more than ${formatMinorAmount({ amount: MAXIMUM_CHARGE_AMOUNT, currency })} ${currency}`,
      param: "amount",
      code: "amount_too_large",
    });
  }
}
