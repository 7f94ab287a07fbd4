"use client";

import { useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { stopRoostQuestionsAction } from "@/lib/roost-reports/actions";

export function StopQuestionsButton({ token }: { token: string }) {
  const [busy, setBusy] = useState(false);
  const [answer, setAnswer] = useState<{ ok: boolean; text: string } | null>(null);

  async function stop() {
    setBusy(true);
    const result = await stopRoostQuestionsAction({ token });
    setBusy(false);
    setAnswer(
      result.ok
        ? { ok: true, text: `Done: no more end-of-season questions to ${result.data.address}. Order messages still come when you buy.` }
        : { ok: false, text: result.error.message },
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
      Stop these questions
    </Button>
  );
}
