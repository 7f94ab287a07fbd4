"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { resendStatementAction } from "@/lib/giving/actions";

/** Send a donor's year-end statement again, after a confirmation step. */
export function ResendStatement({ userId, year, email }: { userId: string; year: number; email: string }) {
  const [confirming, setConfirming] = useState(false);
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<string | null>(null);

  async function send() {
    setBusy(true);
    try {
      const result = await resendStatementAction({ userId, year });
      setMessage(result.ok ? `Queued: the ${year} statement goes to ${email} again.` : result.error.message);
      setConfirming(false);
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-col gap-3">
      {message ? (
        <p role="status" className="rounded-lg bg-moss-50 p-3 font-bold text-moss-900">
          {message}
        </p>
      ) : null}
      {confirming ? (
        <div className="flex flex-wrap items-center gap-3" role="group" aria-label="Confirm sending again">
          <p>
            Send the {year} statement to {email} again?
          </p>
          <Button onClick={send} loading={busy}>
            Yes, send it
          </Button>
          <Button variant="ghost" onClick={() => setConfirming(false)}>
            Cancel
          </Button>
        </div>
      ) : (
        <Button variant="secondary" onClick={() => setConfirming(true)}>
          Send this statement again
        </Button>
      )}
    </div>
  );
}
