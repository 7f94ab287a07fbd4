import "server-only";
import Stripe from "stripe";
import { env } from "@/lib/config/env";

const globalForStripe = globalThis as unknown as { __roostwrightStripe?: Stripe };

/**
 * The payments SDK, pointed at the service named by STRIPE_API_BASE (the local stand-in unless
 * configured otherwise). Production changes configuration only.
 */
export function getPayments(): Stripe {
  if (globalForStripe.__roostwrightStripe) return globalForStripe.__roostwrightStripe;
  const settings = env();
  const base = settings.STRIPE_API_BASE ? new URL(settings.STRIPE_API_BASE) : null;
  const local = base && !base.hostname.endsWith("stripe.com");
  globalForStripe.__roostwrightStripe = new Stripe(settings.STRIPE_SECRET_KEY, {
    telemetry: false,
    maxNetworkRetries: process.env.NODE_ENV === "test" ? 0 : 2,
    timeout: 20_000,
    ...(local
      ? { host: base.hostname, port: Number(base.port || 80), protocol: base.protocol.replace(":", "") as "http" | "https" }
      : {}),
  });
  return globalForStripe.__roostwrightStripe;
}

/** Verifies a webhook delivery on its raw body (signature, and at most 300 s old). Throws when it is not genuine. */
export function verifyWebhook(rawBody: string, signature: string | null): Stripe.Event {
  if (!signature) throw new Error("No Stripe-Signature header.");
  return getPayments().webhooks.constructEvent(rawBody, signature, env().STRIPE_WEBHOOK_SECRET, 300);
}

/**
 * The stand-in's browser script for the pages that take a card, or null against the real service
 * (whose SDK loads its own script). See lib/checkout/payments-browser.ts.
 */
export function standInBrowserScript(): string | null {
  const settings = env();
  if (!settings.useStandIns || !settings.STRIPE_API_BASE) return null;
  return `${settings.STRIPE_API_BASE.replace(/\/+$/, "")}/stripe.js`;
}
