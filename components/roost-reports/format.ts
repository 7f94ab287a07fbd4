/** 0.4 → "40%"; shares are shown whole-percent (n is small, more digits would overstate them). */
export function percent(share: number): string {
  return `${Math.round(share * 100)}%`;
}

export function intervalWords(interval: { lower: number; upper: number }): string {
  return `95% interval ${percent(interval.lower)} to ${percent(interval.upper)}`;
}
