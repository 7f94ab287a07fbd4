import { centerDate } from "./center-time";

// When the year-end statements go out by themselves: on the first days of January in the
// center's own calendar, for the year just ended. A week gives a center whose server was down
// on January 1 time to catch up; the outbox's dedupe key keeps it to one statement per donor and
// year however often the run repeats. The week is common practice, no source (donors are
// usually told to expect year-end statements in January).

export const STATEMENT_WINDOW_DAYS = 7;

/** The year whose statements are due at this instant, or null outside the window. */
export function statementYearDue(now: Date, timeZone: string): number | null {
  const { year, month, day } = centerDate(now, timeZone);
  if (month !== 1 || day > STATEMENT_WINDOW_DAYS) return null;
  return year - 1;
}

/** The outbox's dedupe key for the January statement: one per donor and year. */
export function januaryStatementKey({ userId, year }: { userId: string; year: number }): string {
  return `year-end-statement:january:${userId}:${year}`;
}
