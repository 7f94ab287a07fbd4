import { createServer, type IncomingMessage } from "node:http";
import Stripe from "stripe";
import { closeServer, listenOnLoopback, readBody } from "@/stand-ins/shared/http";

export const TEST_SECRET_KEY = "sk_test_roostwright_stand_in_tests";
export const TEST_PUBLISHABLE_KEY = "pk_test_roostwright_stand_in_tests";
export const TEST_WEBHOOK_SECRET = "whsec_roostwright_tests_0123456789abcdef";

/** The real SDK, aimed at the local stand-in exactly as the app configures it locally. */
export function createStripeClient({ url, key = TEST_SECRET_KEY }: { url: string; key?: string }) {
  const { port } = new URL(url);
  return new Stripe(key, {
    host: "localhost",
    port: Number(port),
    protocol: "http",
    telemetry: false,
    maxNetworkRetries: 0,
  });
}

export interface ReceivedWebhook {
  rawBody: string;
  signature: string;
  receivedAt: number;
}

/**
 * A tiny webhook endpoint: records every POST and answers with the status `respond` picks,
 * so tests can make the first deliveries fail.
 */
export async function startWebhookReceiver({
  respond = () => 200,
}: { respond?: (count: number, req: IncomingMessage) => number } = {}) {
  const received: ReceivedWebhook[] = [];
  const server = createServer((req, res) => {
    void readBody(req).then((rawBody) => {
      received.push({
        rawBody,
        signature: String(req.headers["stripe-signature"] ?? ""),
        receivedAt: Date.now(),
      });
      res.writeHead(respond(received.length, req)).end();
    });
  });
  const url = await listenOnLoopback({ server, port: 0 });
  return { url: `${url}/api/webhooks/stripe`, received, close: () => closeServer(server) };
}

export async function waitFor<T>(
  probe: () => T | undefined,
  { timeoutMs = 5_000 } = {},
): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = probe();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error("waitFor timed out");
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}
