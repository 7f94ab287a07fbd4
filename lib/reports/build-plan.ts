// The build plan: how many of each model the workshop should build before next spring.
//
// Rule (common practice, no source: a seasonal naive forecast, "sell what sold in the same
// months last year", less what is on the shelf):
//   horizon   = the calendar months from this month through the end of next spring (May);
//   expected  = the units of the model sold in those same calendar months one year earlier;
//   build     = max(0, expected − stock on hand);
//   start by  = the first day of spring (March 1) less the workshop's lead time, so the
//               houses are ready when spring sales begin; if that day has passed, start now.
// Spring is March to May, when bat houses are put up before the colonies return (PRODUCT.md §7:
// the maternity season starts roughly in April). Northern-hemisphere calendar, as the store's.

export type MonthlySales = Record<string, number>; // "YYYY-MM" → units sold

export type BuildPlanInput = {
  /** The plan's "today", as a center calendar date. */
  today: { year: number; month: number; day: number };
  leadTimeWeeks: number;
  models: { slug: string; name: string; stock: number; sales: MonthlySales }[];
};

export type BuildPlanLine = { slug: string; name: string; stock: number; expected: number; build: number };
export type BuildPlan = { horizon: string[]; basis: string[]; springStarts: string; startBy: string; lines: BuildPlanLine[] };

const SPRING_START_MONTH = 3;
const SPRING_END_MONTH = 5;

function key(year: number, month: number): string {
  return `${year}-${String(month).padStart(2, "0")}`;
}

function isoDay(date: Date): string {
  return date.toISOString().slice(0, 10);
}

export function buildPlan({ today, leadTimeWeeks, models }: BuildPlanInput): BuildPlan {
  if (!Number.isInteger(leadTimeWeeks) || leadTimeWeeks < 0) throw new RangeError(`Not a lead time: ${leadTimeWeeks} weeks.`);
  // Next spring: this year's if its end is still ahead, else next year's.
  const springYear = today.month <= SPRING_END_MONTH ? today.year : today.year + 1;
  const horizon: string[] = [];
  const basis: string[] = [];
  for (let y = today.year, m = today.month; y < springYear || (y === springYear && m <= SPRING_END_MONTH); m === 12 ? ((m = 1), (y += 1)) : (m += 1)) {
    horizon.push(key(y, m));
    basis.push(key(y - 1, m));
  }
  const springStart = new Date(Date.UTC(springYear, SPRING_START_MONTH - 1, 1));
  const startBy = new Date(springStart.getTime() - leadTimeWeeks * 7 * 86_400_000);
  const todayDate = new Date(Date.UTC(today.year, today.month - 1, today.day));
  const lines = models.map((model) => {
    if (!Number.isInteger(model.stock) || model.stock < 0) throw new RangeError(`${model.slug}: stock must be a whole number ≥ 0.`);
    const expected = basis.reduce((sum, month) => sum + (model.sales[month] ?? 0), 0);
    return { slug: model.slug, name: model.name, stock: model.stock, expected, build: Math.max(0, expected - model.stock) };
  });
  return { horizon, basis, springStarts: isoDay(springStart), startBy: isoDay(startBy < todayDate ? todayDate : startBy), lines };
}
