import { describe, expect, it } from "vitest";
import { decodeForm, splitBracketKey } from "@/stand-ins/shared/form-decode";
import {
  TEST_CARDS,
  TEST_PAYMENT_METHOD_TOKENS,
  detectCardBrand,
  findCardDetailsProblem,
  isLuhnValid,
  resolveCardOutcome,
} from "@/stand-ins/payments/test-cards";

describe("Luhn check (Luhn 1960; ISO/IEC 7812-1)", () => {
  it("accepts the widely published worked example 7992739871-3 and rejects its neighbours", () => {
    expect(isLuhnValid("79927398713")).toBe(true);
    for (const wrong of [
      "79927398710",
      "79927398711",
      "79927398712",
      "79927398714",
      "79927398719",
    ]) {
      expect(isLuhnValid(wrong)).toBe(false);
    }
  });

  it("accepts every published test card and refuses one-digit slips and non-digits", () => {
    TEST_CARDS.forEach((card) => expect(isLuhnValid(card.number)).toBe(true));
    expect(isLuhnValid("4242424242424241")).toBe(false);
    expect(isLuhnValid("4242 4242 4242 4242")).toBe(false);
    expect(isLuhnValid("")).toBe(false);
  });
});

describe("test cards (payment provider's published test numbers, 2024)", () => {
  it("pays with 4242…, declines 0002 generically and 9995 for insufficient funds", () => {
    expect(resolveCardOutcome("4242424242424242")).toEqual({ kind: "succeeds" });
    expect(resolveCardOutcome("4000000000000002")).toMatchObject({
      code: "card_declined",
      declineCode: "generic_decline",
    });
    expect(resolveCardOutcome("4000000000009995")).toMatchObject({
      code: "card_declined",
      declineCode: "insufficient_funds",
    });
    // Any other valid number is a "live" card in test mode.
    expect(resolveCardOutcome("4111111111111111")).toMatchObject({
      declineCode: "test_mode_live_card",
    });
  });

  it("maps every pm_card_* token to a listed card", () => {
    for (const digits of Object.values(TEST_PAYMENT_METHOD_TOKENS)) {
      expect(TEST_CARDS.some((card) => card.number === digits)).toBe(true);
    }
  });

  it("detects brands at the edges of the 2-series Mastercard range (2221–2720)", () => {
    expect(detectCardBrand("4242424242424242")).toBe("visa");
    expect(detectCardBrand("2220999999999999")).toBe("unknown");
    expect(detectCardBrand("2221000000000009")).toBe("mastercard");
    expect(detectCardBrand("2720999999999999")).toBe("mastercard");
    expect(detectCardBrand("2721000000000000")).toBe("unknown");
    expect(detectCardBrand("378282246310005")).toBe("amex");
  });
});

describe("card details before a charge", () => {
  const now = new Date(Date.UTC(2026, 5, 15));
  const good = { number: "4242 4242 4242 4242", expMonth: 6, expYear: 2026, cvc: "123", now };

  it("accepts a card that expires this month and refuses last month", () => {
    expect(findCardDetailsProblem(good)).toBeNull();
    expect(findCardDetailsProblem({ ...good, expMonth: 5 })).toMatchObject({
      code: "invalid_expiry_month",
    });
    expect(findCardDetailsProblem({ ...good, expYear: 2025, expMonth: 12 })).toMatchObject({
      code: "invalid_expiry_year",
    });
    expect(findCardDetailsProblem({ ...good, expYear: 27 })).toBeNull();
  });

  it("checks month bounds, CVC length 3–4 and the number", () => {
    expect(findCardDetailsProblem({ ...good, expMonth: 0, expYear: 2027 })).toMatchObject({
      code: "invalid_expiry_month",
    });
    expect(findCardDetailsProblem({ ...good, expMonth: 13, expYear: 2027 })).toMatchObject({
      code: "invalid_expiry_month",
    });
    expect(findCardDetailsProblem({ ...good, cvc: "12" })).toMatchObject({ code: "invalid_cvc" });
    expect(findCardDetailsProblem({ ...good, cvc: "1234" })).toBeNull();
    expect(findCardDetailsProblem({ ...good, cvc: "12345" })).toMatchObject({
      code: "invalid_cvc",
    });
    expect(findCardDetailsProblem({ ...good, number: "4242424242424241" })).toMatchObject({
      code: "incorrect_number",
    });
  });
});

describe("form decoding with bracket notation", () => {
  it("splits keys and rebuilds objects and arrays as the SDK encoded them", () => {
    expect(splitBracketKey("payment_method_data[card][number]")).toEqual([
      "payment_method_data",
      "card",
      "number",
    ]);
    expect(splitBracketKey("odd]key[")).toEqual(["odd]key["]);
    const body =
      "amount=12900&metadata[orderId]=ord_1&metadata[note]=a%20b%26c&automatic_payment_methods[enabled]=true" +
      "&expand[0]=latest_charge&expand[1]=customer&tags[]=x&tags[]=y";
    expect(decodeForm(body)).toEqual({
      amount: "12900",
      metadata: { orderId: "ord_1", note: "a b&c" },
      automatic_payment_methods: { enabled: "true" },
      expand: ["latest_charge", "customer"],
      tags: ["x", "y"],
    });
  });

  it("drops keys that would reach Object.prototype", () => {
    const decoded = decodeForm("__proto__[polluted]=1&a[constructor][x]=2&ok=1");
    expect(decoded).toEqual({ ok: "1" });
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});
