import { describe, expect, it } from "vitest";
import {
  signAnswerToken,
  signOptOutToken,
  TOKEN_LIFE_DAYS,
  tokenFingerprint,
  verifyAnswerToken,
  verifyOptOutToken,
} from "@/lib/roost-reports/report-tokens";

const secret = "unit-test-secret-unit-test-secret-0123";
const now = new Date("2026-09-02T10:00:00Z");
const claims = { orderLineId: "4b1c4f1e-2d5a-4a6b-9f3e-1a2b3c4d5e6f", unit: 2, season: 2026, answer: "signs" as const };

describe("roost report tokens", () => {
  it("round-trips the house, season and answer, with a random id of 128 bits", () => {
    const token = signAnswerToken({ secret, claims, now });
    const verified = verifyAnswerToken({ secret, token, now });
    expect(verified).toEqual({ ok: true, claims: { ...claims, nonce: expect.stringMatching(/^[A-Za-z0-9_-]{22}$/) } });
    expect(Buffer.from(verified.ok ? verified.claims.nonce : "", "base64url")).toHaveLength(16);
  });

  it("signs the same answer twice as two different links, each with its own id (single use needs that)", () => {
    const a = signAnswerToken({ secret, claims, now });
    const b = signAnswerToken({ secret, claims, now });
    expect(a).not.toBe(b);
    const [va, vb] = [verifyAnswerToken({ secret, token: a, now }), verifyAnswerToken({ secret, token: b, now })];
    expect(va.ok && vb.ok && va.claims.nonce !== vb.claims.nonce).toBe(true);
    // The id is signed: changing it is a forgery.
    const [v, body, sig] = a.split(".");
    const changed = JSON.parse(Buffer.from(body!, "base64url").toString());
    changed.n = "A".repeat(22);
    expect(verifyAnswerToken({ secret, token: `${v}.${Buffer.from(JSON.stringify(changed)).toString("base64url")}.${sig}`, now })).toEqual({
      ok: false,
      reason: "forged",
    });
  });

  it("refuses a token with any field changed, or signed with another secret", () => {
    const token = signAnswerToken({ secret, claims, now });
    const [v, body, sig] = token.split(".");
    const changed = JSON.parse(Buffer.from(body!, "base64url").toString());
    changed.a = "bats_seen";
    const tampered = `${v}.${Buffer.from(JSON.stringify(changed)).toString("base64url")}.${sig}`;
    expect(verifyAnswerToken({ secret, token: tampered, now })).toEqual({ ok: false, reason: "forged" });
    const other = signAnswerToken({ secret: "another-secret-another-secret-0123456", claims, now });
    expect(verifyAnswerToken({ secret, token: other, now })).toEqual({ ok: false, reason: "forged" });
    expect(verifyAnswerToken({ secret, token: `${token}x`, now }).ok).toBe(false);
    expect(verifyAnswerToken({ secret, token: "r1.abc", now })).toEqual({ ok: false, reason: "malformed" });
  });

  it("refuses a token made for another purpose, both ways", () => {
    const optOut = signOptOutToken({ secret, claims: { orderId: claims.orderLineId, email: "a@example.org" }, now });
    expect(verifyAnswerToken({ secret, token: optOut, now })).toEqual({ ok: false, reason: "wrong-purpose" });
    const answer = signAnswerToken({ secret, claims, now });
    expect(verifyOptOutToken({ secret, token: answer, now })).toEqual({ ok: false, reason: "wrong-purpose" });
    expect(verifyOptOutToken({ secret, token: optOut, now })).toMatchObject({ ok: true, claims: { email: "a@example.org" } });
  });

  it("reads a link that kept the full stop of its sentence, and still checks its signature", () => {
    const optOut = signOptOutToken({ secret, claims: { orderId: claims.orderLineId, email: "a@example.org" }, now });
    expect(verifyOptOutToken({ secret, token: `${optOut}.`, now })).toEqual({ ok: true, claims: { orderId: claims.orderLineId, email: "a@example.org" } });
    expect(verifyAnswerToken({ secret, token: `${signAnswerToken({ secret, claims, now })}..`, now })).toMatchObject({ ok: true, claims });
    expect(verifyAnswerToken({ secret, token: `${optOut}.`, now })).toEqual({ ok: false, reason: "wrong-purpose" });
    const [v, body, sig] = optOut.split(".");
    expect(verifyOptOutToken({ secret, token: `${v}.${body}.${sig!.slice(0, -2)}AA.`, now })).toEqual({ ok: false, reason: "forged" });
    expect(verifyOptOutToken({ secret, token: `${v}.${body}.${sig}.x`, now })).toEqual({ ok: false, reason: "malformed" });
  });

  it("expires after its life, the last instant excluded", () => {
    const token = signAnswerToken({ secret, claims, now });
    const end = new Date(Math.floor(now.getTime() / 1000) * 1000 + TOKEN_LIFE_DAYS * 86_400_000);
    expect(verifyAnswerToken({ secret, token, now: new Date(end.getTime() - 1000) }).ok).toBe(true);
    expect(verifyAnswerToken({ secret, token, now: end })).toEqual({ ok: false, reason: "expired" });
  });

  it("keeps a fingerprint, not the token", () => {
    const token = signAnswerToken({ secret, claims, now });
    expect(tokenFingerprint(token)).toMatch(/^[0-9a-f]{64}$/);
    expect(tokenFingerprint(token)).not.toContain(token.slice(3, 20));
  });
});
