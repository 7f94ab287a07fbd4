import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { openText, sealText } from "@/lib/mail/sealed";
import { createToken, getTokenState, hashToken, RESET_TOKEN_TTL_MS } from "@/lib/mail/tokens";

describe("reset tokens", () => {
  it('hashes with SHA-256: the FIPS 180-2 worked example for "abc"', () => {
    // FIPS PUB 180-2 (2002), Appendix B.1: SHA-256("abc").
    expect(hashToken("abc")).toBe(
      "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
    );
  });

  it("creates 256-bit URL-safe tokens and stores only their hash", () => {
    const { token, tokenHash } = createToken();
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(Buffer.from(token, "base64url")).toHaveLength(32);
    expect(tokenHash).toBe(createHash("sha256").update(token).digest("hex"));
    expect(tokenHash).not.toContain(token);
    expect(createToken().token).not.toBe(token);
  });

  it("works for 30 minutes: usable a second before, expired at the instant", () => {
    const issued = new Date("2026-06-01T10:00:00Z");
    const expiresAt = new Date(issued.getTime() + RESET_TOKEN_TTL_MS);
    expect(RESET_TOKEN_TTL_MS).toBe(1_800_000);
    expect(getTokenState({ expiresAt, usedAt: null, now: new Date("2026-06-01T10:29:59Z") })).toBe(
      "usable",
    );
    expect(getTokenState({ expiresAt, usedAt: null, now: new Date("2026-06-01T10:30:00Z") })).toBe(
      "expired",
    );
    expect(getTokenState({ expiresAt, usedAt: issued, now: issued })).toBe("used");
  });
});

describe("sealed payload secrets", () => {
  const secret = "a-secret-of-at-least-thirty-two-characters";

  it("opens what it sealed, and a new IV each time", () => {
    const a = sealText({ text: "token-123", secret });
    const b = sealText({ text: "token-123", secret });
    expect(a).not.toBe(b);
    expect(a).not.toContain("token-123");
    expect(openText({ sealed: a, secret })).toBe("token-123");
  });

  it("refuses another secret and any tampering", () => {
    const sealed = sealText({ text: "token-123", secret });
    expect(openText({ sealed, secret: `${secret}!` })).toBeNull();
    const [v, iv, tag, body] = sealed.split(".");
    const flipped = Buffer.from(body!, "base64url");
    flipped[0] = flipped[0]! ^ 1;
    expect(
      openText({ sealed: [v, iv, tag, flipped.toString("base64url")].join("."), secret }),
    ).toBeNull();
    expect(openText({ sealed: "v2.a.b.c", secret })).toBeNull();
  });
});
