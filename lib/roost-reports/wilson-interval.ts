// The Wilson score interval for a binomial proportion (E. B. Wilson, "Probable inference, the
// law of succession, and statistical inference", Journal of the American Statistical
// Association 22, 1927), without continuity correction: method 3 of R. G. Newcombe, "Two-sided
// confidence intervals for the single proportion: comparison of seven methods", Statistics in
// Medicine 17, 1998, whose worked examples the tests check (81/263 → 0.2553–0.3662, …).
//
//   centre = (p̂ + z²/2n) / (1 + z²/n)
//   half   = z / (1 + z²/n) · √( p̂(1 − p̂)/n + z²/4n² )
//
// Unlike the plain p̂ ± z·√(p̂(1−p̂)/n), it never leaves [0, 1] and stays sensible at 0/n and
// n/n, which is where a small store's counts live.

/** z for a two-sided 95% interval: the 0.975 quantile of the standard normal distribution. */
export const Z_95 = 1.959963984540054;

export type Interval = { lower: number; upper: number };

export function wilsonInterval({ successes, trials, z = Z_95 }: { successes: number; trials: number; z?: number }): Interval {
  if (!Number.isInteger(trials) || trials < 1) throw new RangeError("Trials must be a whole number of at least 1.");
  if (!Number.isInteger(successes) || successes < 0 || successes > trials)
    throw new RangeError("Successes must be a whole number from 0 to the number of trials.");
  if (!(z > 0)) throw new RangeError("z must be positive.");
  const p = successes / trials;
  const z2 = z * z;
  const denominator = 1 + z2 / trials;
  const centre = (p + z2 / (2 * trials)) / denominator;
  const half = (z / denominator) * Math.sqrt((p * (1 - p)) / trials + z2 / (4 * trials * trials));
  // At 0/n and n/n the ends are exactly 0 and 1 in exact arithmetic; clamp the rounding dust.
  return {
    lower: successes === 0 ? 0 : Math.max(0, centre - half),
    upper: successes === trials ? 1 : Math.min(1, centre + half),
  };
}
