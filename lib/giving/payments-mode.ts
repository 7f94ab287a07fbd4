import "server-only";
import { env } from "@/lib/config/env";

/**
 * True when the app talks to the local payments stand-in (development, tests, the demo) rather
 * than the real service. Then every monthly gift's customer gets its own test clock, so a test
 * or a demo can move that donor's time forward and watch the renewals; the real service never
 * sees one.
 */
export function paymentsAreLocal(): boolean {
  const base = env().STRIPE_API_BASE;
  if (!base) return false;
  return !new URL(base).hostname.endsWith("stripe.com");
}
