import { createHash, randomBytes } from "node:crypto";

// Single-use tokens sent by e-mail (password reset). Only the SHA-256 of a token is stored, so a
// copy of the database cannot be used to reset anyone's password. 32 random bytes is 256 bits,
// well above the 64 bits of entropy OWASP asks of session identifiers (OWASP Session Management
// Cheat Sheet; from memory). The 30-minute life is the rule.

export const RESET_TOKEN_TTL_MS = 30 * 60_000;

export function hashToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

export function createToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, tokenHash: hashToken(token) };
}

export type TokenState = "usable" | "used" | "expired";

/** A token works once, and only before it expires (the expiry instant itself is too late). */
export function getTokenState({
  expiresAt,
  usedAt,
  now,
}: {
  expiresAt: Date;
  usedAt: Date | null;
  now: Date;
}): TokenState {
  if (usedAt) return "used";
  return now.getTime() < expiresAt.getTime() ? "usable" : "expired";
}
