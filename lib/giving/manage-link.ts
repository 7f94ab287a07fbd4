import { createHmac, timingSafeEqual } from "node:crypto";

// The private link that lets a donor change or stop a monthly gift without signing in: the
// gift's id with an HMAC-SHA256 of it under the server's secret (common practice, no source).
// Whoever holds the link can manage that one gift and nothing else; it is sent only to the
// donor's own address.

const PURPOSE = "monthly-gift-manage";

export function manageToken({ monthlyGiftId, secret }: { monthlyGiftId: string; secret: string }): string {
  return createHmac("sha256", secret).update(`${PURPOSE}:${monthlyGiftId}`).digest("base64url");
}

export function isManageToken({ monthlyGiftId, token, secret }: { monthlyGiftId: string; token: string | null | undefined; secret: string }): boolean {
  if (!token || token.length > 100) return false;
  const expected = Buffer.from(manageToken({ monthlyGiftId, secret }));
  const given = Buffer.from(token);
  return given.length === expected.length && timingSafeEqual(given, expected);
}

export function managePath({ monthlyGiftId, secret }: { monthlyGiftId: string; secret: string }): string {
  return `/give/monthly/${monthlyGiftId}?s=${manageToken({ monthlyGiftId, secret })}`;
}
