"use client";

import { useTransition } from "react";
import { resendMailAction } from "@/lib/mail/actions";
import { Button } from "@/components/ui/button";
import { useToast } from "@/components/ui/toast";

export function ResendButton({
  id,
  status,
  subject,
}: {
  id: string;
  status: "pending" | "sent" | "failed";
  subject: string;
}) {
  const [pending, startTransition] = useTransition();
  const toast = useToast();
  const label = status === "sent" ? "Send again" : "Retry now";
  return (
    <Button
      size="sm"
      variant="secondary"
      loading={pending}
      aria-label={`${label}: ${subject}`}
      onClick={() =>
        startTransition(async () => {
          const result = await resendMailAction({ id });
          if (!result.ok) return void toast.notify({ tone: "poor", title: result.error.message });
          toast.notify({
            tone: "good",
            title:
              result.data.mode === "copied" ? "A new copy is queued." : "Queued to try again now.",
          });
        })
      }
    >
      {label}
    </Button>
  );
}
