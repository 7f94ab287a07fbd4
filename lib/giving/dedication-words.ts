import { formatUsd } from "@/lib/checkout/money";

// What a receipt adds about a gift's extras. A tribute names someone, but the contribution and
// its deduction are the donor's alone (IRS Publication 526, "Contributions You Can Deduct": the
// deduction belongs to whoever made the gift; from memory). The fee a donor chose to cover went
// to the center with the gift, so it is part of the contribution.

export type Dedication = { tributeKind: string | null; tributeName: string | null; feeCoveredCents: number };

export function dedicationLines(d: Dedication | null): string[] {
  if (!d) return [];
  const lines: string[] = [];
  if (d.tributeKind && d.tributeName) {
    lines.push(`This gift was made ${d.tributeKind === "memory" ? "in memory of" : "in honour of"} ${d.tributeName}.`);
    lines.push("The contribution, and any deduction for it, is yours as the donor.");
  }
  if (d.feeCoveredCents > 0) {
    lines.push(`It includes ${formatUsd(d.feeCoveredCents)} you added to cover the card fee; that is part of your gift.`);
  }
  return lines;
}
