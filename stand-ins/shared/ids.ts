import { randomBytes, randomUUID } from "node:crypto";

const ALPHABET = "0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz";

/**
 * Stripe-style object id: a type prefix, an underscore, then 24 base-62 characters
 * (`pi_3Q…`, `evt_1…`). Common practice, no source: the shape is what matters to code
 * that stores or checks these ids, not the exact length.
 */
export function createPrefixedId({
  prefix,
  length = 24,
}: {
  prefix: string;
  length?: number;
}): string {
  const bytes = randomBytes(length);
  let body = "";
  for (const byte of bytes) body += ALPHABET[byte % ALPHABET.length];
  return `${prefix}_${body}`;
}

/** Resend uses UUID v4 ids for e-mails. */
export function createUuid(): string {
  return randomUUID();
}

export function nowInUnixSeconds(): number {
  return Math.floor(Date.now() / 1000);
}
