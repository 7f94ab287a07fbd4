// The reports' date range from the address: `?from=YYYY-MM-DD&to=YYYY-MM-DD`, both center
// calendar days and both included. Missing or malformed → from January 1 of the center's year to
// today; a `to` before `from` falls back to today. Common practice, no source.

const DAY = /^\d{4}-\d{2}-\d{2}$/;

function isDay(value: unknown): value is string {
  if (typeof value !== "string" || !DAY.test(value)) return false;
  const parsed = new Date(`${value}T00:00:00Z`);
  return !Number.isNaN(parsed.getTime()) && parsed.toISOString().slice(0, 10) === value;
}

export function reportRange(asked: Record<string, unknown>, today: string): { from: string; to: string } {
  const from = isDay(asked.from) ? asked.from : `${today.slice(0, 4)}-01-01`;
  const to = isDay(asked.to) && asked.to >= from ? asked.to : today >= from ? today : from;
  return { from, to };
}
