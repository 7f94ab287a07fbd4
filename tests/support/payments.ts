import { createHmac } from "node:crypto";
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { startPaymentsStandIn, type PaymentsStandIn } from "@/stand-ins/payments/server";
import { POST as webhookPost } from "@/app/api/webhooks/stripe/route";

/** Signs a body exactly as the payment service does: HMAC-SHA256 of "t.body" keyed by the whole secret. */
export function signPayload(body: string, { secret = process.env.STRIPE_WEBHOOK_SECRET!, at = Math.floor(Date.now() / 1000) } = {}) {
  const v1 = createHmac("sha256", secret).update(`${at}.${body}`).digest("hex");
  return `t=${at},v1=${v1}`;
}

export function deliver(body: string, signature: string | null): Promise<Response> {
  const headers = new Headers({ "content-type": "application/json" });
  if (signature) headers.set("stripe-signature", signature);
  return webhookPost(new Request("http://localhost/api/webhooks/stripe", { method: "POST", body, headers }));
}

/**
 * Starts the payments stand-in on the port STRIPE_API_BASE names, delivering its webhooks to the
 * app's real webhook handler through a tiny local receiver.
 */
export async function startTestPayments(): Promise<{ standIn: PaymentsStandIn; close: () => Promise<void> }> {
  const receiver: Server = createServer(async (req, res) => {
    const chunks: Buffer[] = [];
    for await (const c of req) chunks.push(c as Buffer);
    const response = await deliver(Buffer.concat(chunks).toString("utf8"), (req.headers["stripe-signature"] as string) ?? null);
    res.writeHead(response.status, { "content-type": "application/json" });
    res.end(await response.text());
  });
  await new Promise<void>((resolve) => receiver.listen(0, "127.0.0.1", resolve));
  const port = Number(new URL(process.env.STRIPE_API_BASE!).port);
  const standIn = await startPaymentsStandIn({
    port,
    webhookUrl: `http://127.0.0.1:${(receiver.address() as AddressInfo).port}/`,
    webhookSecret: process.env.STRIPE_WEBHOOK_SECRET!,
    secretKey: process.env.STRIPE_SECRET_KEY!,
    publishableKey: process.env.STRIPE_PUBLISHABLE_KEY!,
    webhookRetryDelaysMs: [50, 100, 200, 400],
  });
  return {
    standIn,
    close: async () => {
      await standIn.close();
      await new Promise<void>((resolve) => receiver.close(() => resolve()));
    },
  };
}
