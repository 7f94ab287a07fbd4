import { createCipheriv, createDecipheriv, hkdfSync, randomBytes } from "node:crypto";

// A secret that must sit in the outbox until its e-mail is sent (a reset token) is sealed with
// AES-256-GCM under a key derived from the app secret, so the outbox table alone does not give
// it away. Key derivation: HKDF-SHA256 (RFC 5869); AES-GCM with a 96-bit random IV and a
// 128-bit tag (NIST SP 800-38D).

const VERSION = "v1";

function keyFrom(secret: string): Buffer {
  return Buffer.from(hkdfSync("sha256", secret, "roostwright", "outbox-sealed-payload", 32));
}

export function sealText({ text, secret }: { text: string; secret: string }): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv("aes-256-gcm", keyFrom(secret), iv);
  const body = Buffer.concat([cipher.update(text, "utf8"), cipher.final()]);
  return [
    VERSION,
    iv.toString("base64url"),
    cipher.getAuthTag().toString("base64url"),
    body.toString("base64url"),
  ].join(".");
}

/** The sealed text, or null when it was sealed under another secret or tampered with. */
export function openText({ sealed, secret }: { sealed: string; secret: string }): string | null {
  const [version, iv, tag, body] = sealed.split(".");
  if (version !== VERSION || !iv || !tag || body === undefined) return null;
  try {
    const decipher = createDecipheriv("aes-256-gcm", keyFrom(secret), Buffer.from(iv, "base64url"));
    decipher.setAuthTag(Buffer.from(tag, "base64url"));
    return Buffer.concat([
      decipher.update(Buffer.from(body, "base64url")),
      decipher.final(),
    ]).toString("utf8");
  } catch {
    return null;
  }
}
