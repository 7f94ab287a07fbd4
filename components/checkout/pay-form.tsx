"use client";

import { Elements, PaymentElement, useElements, useStripe } from "@stripe/react-stripe-js";
import { loadPaymentsSdk } from "@/lib/checkout/payments-browser";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/form-error";
import { cartActions } from "@/lib/checkout/cart-store";
import { fetchJson, isApiError } from "@/lib/http/client";
import { formatUsd } from "@/lib/checkout/money";

const appearance = {
  theme: "stripe" as const,
  variables: { colorPrimary: "#2f5a45", colorText: "#1c2420", fontSizeBase: "17px", borderRadius: "8px" },
};

/** Card payment with the payment SDK's own Elements; the amount was fixed by the server. */
export function PayForm(props: { orderId: string; token: string; clientSecret: string; publishableKey: string; standInScript: string | null; totalCents: number; returnUrl: string }) {
  return (
    <Elements stripe={loadPaymentsSdk(props.publishableKey, props.standInScript)} options={{ clientSecret: props.clientSecret, appearance }}>
      <PayInner {...props} />
    </Elements>
  );
}

function PayInner({ orderId, token, totalCents, returnUrl }: { orderId: string; token: string; totalCents: number; returnUrl: string }) {
  const stripe = useStripe();
  const elements = useElements();
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function pay(e: React.FormEvent) {
    e.preventDefault();
    if (!stripe || !elements) return;
    setBusy(true);
    setError(null);
    try {
      const submitted = await elements.submit();
      if (submitted.error) {
        setError(submitted.error.message ?? "Check the card details.");
        return;
      }
      // Holds the stock again if an earlier attempt on this order failed and released it.
      try {
        await fetchJson(`/api/checkout/${orderId}/hold`, { json: { token }, fallbackMessage: "This order can no longer be paid." });
      } catch (error) {
        if (!isApiError(error)) throw error;
        setError(error.message);
        return;
      }
      const result = await stripe.confirmPayment({ elements, confirmParams: { return_url: returnUrl }, redirect: "if_required" });
      if (result.error) {
        setError(declineMessage(result.error));
        return;
      }
      cartActions.clear();
      router.push(returnUrl);
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={pay} className="flex flex-col gap-5" aria-label="Pay by card">
      <PaymentElement />
      <FormError message={error} />
      <Button type="submit" size="lg" loading={busy} disabled={!stripe || !elements}>
        Pay {formatUsd(totalCents)}
      </Button>
    </form>
  );
}

function declineMessage(error: { type?: string; code?: string; decline_code?: string; message?: string }): string {
  if (error.decline_code === "insufficient_funds") return "Your card was declined for insufficient funds. Nothing was charged; try another card.";
  if (error.type === "card_error") return `${error.message ?? "Your card was declined."} Nothing was charged; check the details or try another card.`;
  return error.message ?? "The payment did not go through. Nothing was charged; please try again.";
}
