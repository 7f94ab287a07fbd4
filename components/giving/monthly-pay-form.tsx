"use client";

import { Elements, PaymentElement, useElements, useStripe } from "@stripe/react-stripe-js";
import { loadPaymentsSdk } from "@/lib/checkout/payments-browser";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { FormError } from "@/components/ui/form-error";
import { formatUsd } from "@/lib/checkout/money";

const appearance = {
  theme: "stripe" as const,
  variables: { colorPrimary: "#2f5a45", colorText: "#1c2420", fontSizeBase: "17px", borderRadius: "8px" },
};

/** Pays a monthly gift's open invoice (the first one, or one whose renewal failed) with the payment SDK's own form. */
export function MonthlyPayForm(props: { clientSecret: string; publishableKey: string; standInScript: string | null; amountCents: number; returnUrl: string; label: string }) {
  return (
    <Elements stripe={loadPaymentsSdk(props.publishableKey, props.standInScript)} options={{ clientSecret: props.clientSecret, appearance }}>
      <Inner {...props} />
    </Elements>
  );
}

function Inner({ amountCents, returnUrl, label }: { amountCents: number; returnUrl: string; label: string }) {
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
      if (submitted.error) return setError(submitted.error.message ?? "Check the card details.");
      const result = await stripe.confirmPayment({ elements, confirmParams: { return_url: returnUrl }, redirect: "if_required" });
      if (result.error) return setError(`${result.error.message ?? "The payment did not go through."} Nothing was charged; check the details or try another card.`);
      router.replace(returnUrl);
      router.refresh();
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={pay} className="flex flex-col gap-5" aria-label="Pay by card">
      <PaymentElement />
      <FormError message={error} />
      <Button type="submit" size="lg" loading={busy} disabled={!stripe || !elements}>
        {label} {formatUsd(amountCents)}
      </Button>
    </form>
  );
}
