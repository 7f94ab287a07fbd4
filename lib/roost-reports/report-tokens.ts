import { createHash, createHmac, hkdfSync, randomBytes, timingSafeEqual } from "node:crypto";
import { z } from "zod";
import { ROOST_ANSWERS } from "./answers";

// Signed one-click links for roost reports: no sign-in, nothing stored when one is made. A token names exactly
// what it may do (its purpose) and to what: the answer link names the order line, the house
// (unit), the season and the answer; the opt-out link names the order and its e-mail address.
// Each purpose signs with its own key, derived from the app secret with HKDF-SHA256 (RFC 5869),
// so a token made for one purpose cannot be replayed as another even if its fields were to
// match. The signature is HMAC-SHA256 (RFC 2104) truncated to 128 bits, the shortest truncation
// NIST SP 800-107 Rev. 1 (2012, §5.3.4) treats as giving 128-bit security against forgery.
// The life of a link (18 months) covers one season's question and the next: common practice.
// An answer token also carries a random id (128 bits from the system's CSPRNG, common practice
// for one-time links): the answer is recorded with that id, once, so the same link cannot be used
// twice; changing an answer takes another link (each e-mail holds one per answer, and the page
// after an answer offers freshly signed ones).

export const TOKEN_PURPOSES = ["roost-answer", "roost-opt-out"] as const;
export type TokenPurpose = (typeof TOKEN_PURPOSES)[number];

export const TOKEN_LIFE_DAYS = 548;
const VERSION = "r1";
const MAC_BYTES = 16;

const uuid = z.uuid();
const answerClaims = z.object({
  p: z.literal("roost-answer"),
  l: uuid,
  u: z.number().int().min(1).max(10),
  s: z.number().int().min(2000).max(9999),
  a: z.enum(ROOST_ANSWERS),
  n: z.string().regex(/^[A-Za-z0-9_-]{22}$/),
  x: z.number().int(),
});
const optOutClaims = z.object({ p: z.literal("roost-opt-out"), o: uuid, m: z.string().min(3).max(320), x: z.number().int() });

export type AnswerClaims = { orderLineId: string; unit: number; season: number; answer: (typeof ROOST_ANSWERS)[number] };
/** The claims of a verified answer token: what it answers, and the id its single use is kept under. */
export type VerifiedAnswerClaims = AnswerClaims & { nonce: string };
export type OptOutClaims = { orderId: string; email: string };

function keyFor(secret: string, purpose: TokenPurpose): Buffer {
  return Buffer.from(hkdfSync("sha256", secret, "roostwright", `roost-report-token:${purpose}`, 32));
}

function mac(secret: string, purpose: TokenPurpose, body: string): Buffer {
  return createHmac("sha256", keyFor(secret, purpose)).update(`${VERSION}.${body}`).digest().subarray(0, MAC_BYTES);
}

function sign(secret: string, purpose: TokenPurpose, claims: Record<string, unknown>): string {
  const body = Buffer.from(JSON.stringify(claims), "utf8").toString("base64url");
  return `${VERSION}.${body}.${mac(secret, purpose, body).toString("base64url")}`;
}

export type TokenRefusal = "malformed" | "forged" | "wrong-purpose" | "expired";

function open(
  secret: string,
  purpose: TokenPurpose,
  token: string,
  now: Date,
): { ok: true; claims: Record<string, unknown> } | { ok: false; reason: TokenRefusal } {
  if (token.length > 600) return { ok: false, reason: "malformed" };
  // A link at the end of a sentence in the plain-text e-mail ("… Stop these questions <url>.")
  // reaches us with the full stop when a mail program links it: a token never ends in ".", so
  // trailing ones are dropped before the parts are read (the signature is checked all the same).
  const [version, body, signature, extra] = token.replace(/\.+$/, "").split(".");
  if (version !== VERSION || !body || !signature || extra !== undefined) return { ok: false, reason: "malformed" };
  const given = Buffer.from(signature, "base64url");
  let claims: Record<string, unknown>;
  try {
    claims = JSON.parse(Buffer.from(body, "base64url").toString("utf8")) as Record<string, unknown>;
  } catch {
    return { ok: false, reason: "malformed" };
  }
  if (typeof claims !== "object" || claims === null) return { ok: false, reason: "malformed" };
  const expected = mac(secret, purpose, body);
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) {
    // Signed for another purpose: say so (it helps support), but it is refused all the same.
    const other = TOKEN_PURPOSES.find((p) => p !== purpose && claims.p === p);
    if (other) {
      const theirs = mac(secret, other, body);
      if (given.length === theirs.length && timingSafeEqual(given, theirs)) return { ok: false, reason: "wrong-purpose" };
    }
    return { ok: false, reason: "forged" };
  }
  if (claims.p !== purpose) return { ok: false, reason: "wrong-purpose" };
  if (typeof claims.x !== "number" || now.getTime() >= claims.x * 1000) return { ok: false, reason: "expired" };
  return { ok: true, claims };
}

const expiry = (now: Date) => Math.floor(now.getTime() / 1000) + TOKEN_LIFE_DAYS * 86_400;

export function signAnswerToken({ secret, claims, now }: { secret: string; claims: AnswerClaims; now: Date }): string {
  return sign(secret, "roost-answer", {
    p: "roost-answer",
    l: claims.orderLineId,
    u: claims.unit,
    s: claims.season,
    a: claims.answer,
    n: randomBytes(16).toString("base64url"),
    x: expiry(now),
  });
}

export function verifyAnswerToken({
  secret,
  token,
  now,
}: {
  secret: string;
  token: string;
  now: Date;
}): { ok: true; claims: VerifiedAnswerClaims } | { ok: false; reason: TokenRefusal } {
  const opened = open(secret, "roost-answer", token, now);
  if (!opened.ok) return opened;
  const parsed = answerClaims.safeParse(opened.claims);
  if (!parsed.success) return { ok: false, reason: "malformed" };
  const c = parsed.data;
  return { ok: true, claims: { orderLineId: c.l, unit: c.u, season: c.s, answer: c.a, nonce: c.n } };
}

export function signOptOutToken({ secret, claims, now }: { secret: string; claims: OptOutClaims; now: Date }): string {
  return sign(secret, "roost-opt-out", { p: "roost-opt-out", o: claims.orderId, m: claims.email.toLowerCase(), x: expiry(now) });
}

export function verifyOptOutToken({
  secret,
  token,
  now,
}: {
  secret: string;
  token: string;
  now: Date;
}): { ok: true; claims: OptOutClaims } | { ok: false; reason: TokenRefusal } {
  const opened = open(secret, "roost-opt-out", token, now);
  if (!opened.ok) return opened;
  const parsed = optOutClaims.safeParse(opened.claims);
  if (!parsed.success) return { ok: false, reason: "malformed" };
  return { ok: true, claims: { orderId: parsed.data.o, email: parsed.data.m } };
}

/** What a report keeps of the token that sent it: its SHA-256, never the token. */
export function tokenFingerprint(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

export const TOKEN_REFUSAL_WORDS: Record<TokenRefusal, string> = {
  malformed: "This link is not complete. Copy the whole link from the e-mail, or answer from your order page.",
  forged: "This link was not made by our store, or it was changed after we sent it, so it cannot record an answer.",
  "wrong-purpose": "This link was made for something else and cannot record an answer.",
  expired: "This link is too old to use. Answer from your order page instead; the link in your order e-mail opens it.",
};
