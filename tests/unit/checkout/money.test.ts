import { describe, expect, it } from "vitest";
import {
  centsFromDollars,
  formatUsd,
  formatUsdShort,
  parseUsd,
  percentOfCents,
  sumCents,
} from "@/lib/checkout/money";

// Outside reference: the platform's own ICU currency formatter, which formatUsd must match.
const intlUsd = new Intl.NumberFormat("en-US", { style: "currency", currency: "USD" });

// A fixed pseudo-random sequence (mulberry32) so the sweep is the same on every run.
function seededCents(seed: number, count: number): number[] {
  let state = seed;
  const values: number[] = [];
  for (let i = 0; i < count; i += 1) {
    state = (state + 0x6d2b79f5) | 0;
    let t = Math.imul(state ^ (state >>> 15), 1 | state);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    const unit = ((t ^ (t >>> 14)) >>> 0) / 4294967296;
    values.push(Math.floor(unit * 2_000_000_000) - 1_000_000_000);
  }
  return values;
}

describe("formatUsd", () => {
  it("formats the brief's example", () => {
    expect(formatUsd(123_450)).toBe("$1,234.50");
  });

  it.each([0, 1, 5, 99, 100, 101, 99_999, 100_000, 123_456_789, -5, -100, -123_456])(
    "matches Intl.NumberFormat for %i cents",
    (cents) => {
      expect(formatUsd(cents)).toBe(intlUsd.format(cents / 100));
    },
  );

  it("matches Intl.NumberFormat across 2,000 seeded amounts up to ±$10 million", () => {
    for (const cents of seededCents(20_250_818, 2_000)) {
      expect(formatUsd(cents)).toBe(intlUsd.format(cents / 100));
    }
  });

  it("refuses fractions of a cent instead of rounding them away", () => {
    expect(() => formatUsd(12.5)).toThrow(RangeError);
    expect(() => formatUsd(Number.NaN)).toThrow(RangeError);
  });

  it("drops .00 only in the short form", () => {
    expect(formatUsdShort(2_500)).toBe("$25");
    expect(formatUsdShort(2_550)).toBe("$25.50");
    expect(formatUsdShort(100_000)).toBe("$1,000");
  });
});

describe("parseUsd", () => {
  it.each([
    ["$1,234.50", 123_450],
    ["1234.5", 123_450],
    ["25", 2_500],
    [" 25.00 ", 2_500],
    ["$ 7", 700],
    ["0.99", 99],
    [".5", 50],
    ["25.", 2_500],
    ["1,000,000", 100_000_000],
  ])("reads %s as %i cents", (text, cents) => {
    expect(parseUsd(text)).toEqual({ ok: true, cents });
  });

  it.each([
    ["", "Enter an amount"],
    ["-5", "can't be negative"],
    ["1.234", "two digits after the decimal point"],
    ["1,23", "Enter an amount"],
    ["12,34.00", "Enter an amount"],
    ["abc", "Enter an amount"],
    ["1e5", "Enter an amount"],
    [".", "Enter an amount"],
  ])("refuses %j with a message", (text, fragment) => {
    const result = parseUsd(text);
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toContain(fragment);
  });

  it("refuses amounts past exact integer range", () => {
    expect(parseUsd("999999999999999999").ok).toBe(false);
  });
});

describe("centsFromDollars", () => {
  it("rounds through the decimal string, not the float", () => {
    expect(Math.round(1.005 * 100)).toBe(100); // the float trap this function exists for
    expect(centsFromDollars(1.005)).toBe(101);
    expect(centsFromDollars(0.1 + 0.2)).toBe(30);
    expect(centsFromDollars(19.99)).toBe(1_999);
    expect(centsFromDollars(-4.5)).toBe(-450);
    expect(centsFromDollars(0)).toBe(0);
  });

  it("refuses non-numbers", () => {
    expect(() => centsFromDollars(Number.POSITIVE_INFINITY)).toThrow(RangeError);
  });
});

describe("sumCents", () => {
  it("adds whole cents and refuses floats", () => {
    expect(sumCents([1, 2, 3])).toBe(6);
    expect(sumCents([])).toBe(0);
    expect(() => sumCents([100, 0.5])).toThrow(RangeError);
  });
});

describe("percentOfCents (half up to the cent)", () => {
  it.each([
    // cents, basis points, exact value in cents, expected
    [1_000, 725, "72.5", 73],
    [1_000, 724, "72.4", 72],
    [200, 725, "14.5", 15],
    [199, 725, "14.4275", 14],
    [17_800, 725, "1290.5", 1_291],
    [0, 725, "0", 0],
    [12_345, 0, "0", 0],
  ])("%i cents at %i bp (%s) → %i", (cents, basisPoints, _exact, expected) => {
    expect(percentOfCents({ cents, basisPoints })).toBe(expected);
  });

  it("agrees with BigInt half-up arithmetic over a seeded sweep", () => {
    for (const raw of seededCents(7, 500)) {
      const cents = Math.abs(raw) % 5_000_000;
      const basisPoints = Math.abs(raw) % 2_001;
      const exactTimes2 = BigInt(cents) * BigInt(basisPoints) * 2n;
      const expected = Number((exactTimes2 + 10_000n) / 20_000n);
      expect(percentOfCents({ cents, basisPoints })).toBe(expected);
    }
  });

  it("refuses negative or fractional inputs", () => {
    expect(() => percentOfCents({ cents: -1, basisPoints: 725 })).toThrow(RangeError);
    expect(() => percentOfCents({ cents: 100, basisPoints: 7.25 })).toThrow(RangeError);
  });
});
