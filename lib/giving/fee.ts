import { isCents } from "@/lib/checkout/money";

// Covering the card fee: the donor adds what the card processor keeps, so the rescue receives
// the whole gift. The processor keeps a percentage of the amount charged plus a fixed part, so
// the amount to charge is grossed up: charged = ceil((gift + fixed) / (1 − rate)), and the
// addition is charged − gift. Common practice, no source (the usual gross-up of a
// percentage-plus-fixed fee); the rate itself is the center's setting.

/** The amount to add to `giftCents` so that what is left after the fee is at least the gift. */
export function feeToCover({ giftCents, basisPoints, fixedCents }: { giftCents: number; basisPoints: number; fixedCents: number }): number {
  if (!isCents(giftCents) || giftCents <= 0) throw new RangeError(`The gift must be a positive whole number of cents; got ${giftCents}.`);
  if (!Number.isInteger(basisPoints) || basisPoints < 0 || basisPoints >= 10_000) throw new RangeError(`Not a fee rate: ${basisPoints} basis points.`);
  if (!isCents(fixedCents) || fixedCents < 0) throw new RangeError(`Not a fixed fee: ${fixedCents}.`);
  if (basisPoints === 0 && fixedCents === 0) return 0;
  // Integer arithmetic: charged × (10000 − bp) ≥ (gift + fixed) × 10000.
  const charged = Math.ceil(((giftCents + fixedCents) * 10_000) / (10_000 - basisPoints));
  return charged - giftCents;
}

/** What the processor keeps of a charge, rounded to the nearest cent (half up). */
export function feeOn({ chargedCents, basisPoints, fixedCents }: { chargedCents: number; basisPoints: number; fixedCents: number }): number {
  return Math.round((chargedCents * basisPoints) / 10_000) + fixedCents;
}
