import { describe, expect, it } from "vitest";
import { MAX_FAILURES_PER_ACCOUNT, MAX_FAILURES_PER_ADDRESS, throttleVerdict } from "@/lib/auth/throttle";

describe("sign-in throttle verdict", () => {
  it("lets a try through one failure below each limit", () => {
    expect(throttleVerdict({ accountFailures: MAX_FAILURES_PER_ACCOUNT - 1, addressFailures: MAX_FAILURES_PER_ADDRESS - 1 })).toEqual({ throttled: false });
  });

  it("refuses at the account limit, pointing at the password reset", () => {
    const verdict = throttleVerdict({ accountFailures: 5, addressFailures: 0 });
    expect(verdict).toEqual({ throttled: true, message: "Too many tries for this account. Wait 15 minutes, or reset your password." });
  });

  it("refuses at the address limit with the network wording", () => {
    const verdict = throttleVerdict({ accountFailures: 0, addressFailures: 30 });
    expect(verdict).toEqual({ throttled: true, message: "Too many sign-in tries from your network. Wait 15 minutes and try again." });
  });

  it("names the account when both limits are reached", () => {
    const verdict = throttleVerdict({ accountFailures: 5, addressFailures: 30 });
    expect(verdict.throttled && verdict.message).toMatch(/this account/);
  });
});
