"use client";

import { useRouter } from "next/navigation";
import { useEffect, useState } from "react";
import { Spinner } from "@/components/ui/spinner";

/** While the payment's confirmation is still coming from the payment service, look again every 2 s (up to a minute). */
export function PaymentPendingRefresh() {
  const router = useRouter();
  const [tries, setTries] = useState(0);
  useEffect(() => {
    if (tries >= 30) return;
    const timer = setTimeout(() => {
      router.refresh();
      setTries((n) => n + 1);
    }, 2000);
    return () => clearTimeout(timer);
  }, [router, tries]);
  return tries < 30 ? <Spinner label="Waiting for the payment to be confirmed" /> : <p>Still waiting for confirmation. Reload this page in a minute.</p>;
}
