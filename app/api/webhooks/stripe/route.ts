import { NextResponse } from "next/server";
import { verifyWebhook } from "@/lib/checkout/payments";
import { processPaymentEvent, RetryLater } from "@/lib/checkout/commands/webhooks";
import { gated } from "@/lib/http/route";


// Public, but only genuine deliveries count: the signature is checked on the raw body, and an
// unsigned, tampered or older-than-300-s delivery is refused with 400 and no write.
export const POST = gated(async (request: Request) => {
  const raw = await request.text();
  let event;
  try {
    event = verifyWebhook(raw, request.headers.get("stripe-signature"));
  } catch {
    return NextResponse.json(
      { error: { code: "bad_request", message: "The webhook signature does not verify (missing, tampered or too old)." } },
      { status: 400 },
    );
  }
  try {
    // 2xx for every processed event, an order the state machine would not move included: the
    // outcome says what happened, and the service stops retrying.
    const result = await processPaymentEvent(event);
    return NextResponse.json({ received: true, ...result });
  } catch (error) {
    if (error instanceof RetryLater) {
      return NextResponse.json({ error: { code: "unavailable", message: error.message } }, { status: 503 });
    }
    console.error("webhook processing failed", error);
    return NextResponse.json({ error: { code: "internal", message: "Processing failed; it will be retried." } }, { status: 500 });
  }
});
