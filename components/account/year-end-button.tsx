"use client";

import { useState } from "react";
import { emailYearEndStatementAction } from "@/lib/mail/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";

export function YearEndButton({ year, email }: { year: number; email: string }) {
  const [busy, setBusy] = useState(false);
  const [answer, setAnswer] = useState<{ tone: "good" | "info" | "poor"; text: string } | null>(
    null,
  );

  async function send() {
    setBusy(true);
    setAnswer(null);
    const result = await emailYearEndStatementAction({ year });
    setBusy(false);
    if (!result.ok) return setAnswer({ tone: "poor", text: result.error.message });
    setAnswer(
      result.data.queued
        ? { tone: "good", text: `We are sending your ${year} statement to ${email} now.` }
        : {
            tone: "info",
            text: `We already e-mailed your ${year} statement to ${email} today; check your inbox and spam folder.`,
          },
    );
  }

  return (
    <div className="flex flex-col gap-3">
      <Button variant="secondary" loading={busy} onClick={() => void send()}>
        E-mail me the {year} statement
      </Button>
      {answer ? (
        <Alert tone={answer.tone} live>
          {answer.text}
        </Alert>
      ) : null}
    </div>
  );
}
