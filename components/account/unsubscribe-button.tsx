"use client";

import { useState } from "react";
import { unsubscribeAction } from "@/lib/mail/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";

export function UnsubscribeButton({ token }: { token: string }) {
  const [busy, setBusy] = useState(false);
  const [answer, setAnswer] = useState<{ ok: boolean; text: string } | null>(null);

  async function stop() {
    setBusy(true);
    const result = await unsubscribeAction({ token });
    setBusy(false);
    if (!result.ok) return setAnswer({ ok: false, text: result.error.message });
    setAnswer(
      result.data.result === "unsubscribed"
        ? {
            ok: true,
            text: "Done: no more seasonal reminders. You can turn them back on in your e-mail preferences.",
          }
        : { ok: false, text: "This link is no longer valid. Sign in to change your reminders." },
    );
  }

  if (answer) {
    return (
      <Alert tone={answer.ok ? "good" : "poor"} live>
        {answer.text}
      </Alert>
    );
  }
  return (
    <Button onClick={() => void stop()} loading={busy} className="self-start">
      Stop seasonal reminders
    </Button>
  );
}
