import { describe, expect, it } from "vitest";
import {
  BASE_DELAY_MS,
  getRetryDelayMs,
  MAX_ATTEMPTS,
  MAX_DELAY_MS,
  planRetry,
} from "@/lib/mail/backoff";

// Source: truncated exponential backoff as in Google Cloud's "Retry strategy" guidance, whose
// worked sequence with a 1 s start and a 32 s maximum is 1, 2, 4, 8, 16, 32, 32 … s (from memory).

describe("retry delays", () => {
  it("reproduces the published 1, 2, 4, 8, 16, 32, 32 s sequence with a 32 s cap", () => {
    const delays = [1, 2, 3, 4, 5, 6, 7].map(
      (attempt) => getRetryDelayMs({ attempt, baseMs: 1000, capMs: 32_000 }) / 1000,
    );
    expect(delays).toEqual([1, 2, 4, 8, 16, 32, 32]);
  });

  it("waits 30 s after the first failure and never more than an hour", () => {
    expect(getRetryDelayMs({ attempt: 1 })).toBe(BASE_DELAY_MS);
    expect(getRetryDelayMs({ attempt: 7 })).toBe(30_000 * 64);
    expect(getRetryDelayMs({ attempt: 8 })).toBe(MAX_DELAY_MS);
    expect(getRetryDelayMs({ attempt: 500 })).toBe(MAX_DELAY_MS);
  });

  it("refuses attempt numbers below 1 or fractional", () => {
    expect(() => getRetryDelayMs({ attempt: 0 })).toThrow(RangeError);
    expect(() => getRetryDelayMs({ attempt: 1.5 })).toThrow(RangeError);
  });

  it("retries until the tenth failed attempt, then gives up", () => {
    const now = new Date("2026-05-01T00:00:00Z");
    expect(planRetry({ attempts: 1, now })).toEqual({
      giveUp: false,
      at: new Date("2026-05-01T00:00:30Z"),
    });
    expect(planRetry({ attempts: MAX_ATTEMPTS - 1, now }).giveUp).toBe(false);
    expect(planRetry({ attempts: MAX_ATTEMPTS, now })).toEqual({ giveUp: true });
  });

  it("keeps trying for about three hours in all before giving up", () => {
    let total = 0;
    for (let attempt = 1; attempt < MAX_ATTEMPTS; attempt += 1)
      total += getRetryDelayMs({ attempt });
    // 0.5 + 1 + 2 + 4 + 8 + 16 + 32 + 60 + 60 minutes.
    expect(total / 60_000).toBe(183.5);
  });
});
