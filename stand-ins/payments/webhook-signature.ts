import { createHmac } from "node:crypto";

/**
 * The `Stripe-Signature` header the payments service puts on every webhook delivery:
 * `t=<unix seconds>,v1=<hex HMAC-SHA256 of "<t>.<raw body>">`, keyed by the whole `whsec_…` string
 * (prefix included). Source: "Check the webhook signatures", Stripe documentation (2024), and
 * `computeHMACSignature`/`makeHMACContent` in the `stripe` Node SDK v23 (2026), which verifies it.
 */
export function signWebhookPayload({
  payload,
  secret,
  timestamp,
}: {
  payload: string;
  secret: string;
  timestamp: number;
}): string {
  const signature = createHmac("sha256", secret)
    .update(`${timestamp}.${payload}`, "utf8")
    .digest("hex");
  return `t=${timestamp},v1=${signature}`;
}
