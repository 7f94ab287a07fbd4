"use client";

import { useState, type FormEvent } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { Textarea } from "@/components/ui/textarea";
import { confirmLinkAnswerAction } from "@/lib/roost-reports/actions";
import { COUNT_BAND_WORDS, COUNT_BANDS, type RoostAnswer } from "@/lib/roost-reports/answers";
import { MAX_NOTE_CHARS } from "@/lib/roost-reports/report-input";

const DONE_WORDS = {
  recorded: "Thank you: your answer is recorded.",
  changed: "Thank you: your answer is changed.",
  unchanged: "That was already your answer; nothing changed.",
} as const;

/** The button that records an e-mail link's answer, with an optional count and note. */
export function LinkAnswerForm({ token, answer }: { token: string; answer: RoostAnswer }) {
  const [busy, setBusy] = useState(false);
  const [done, setDone] = useState<{ ok: boolean; text: string } | null>(null);

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    setBusy(true);
    const result = await confirmLinkAnswerAction({
      token,
      countBand: (form.get("countBand") as string | null) ?? undefined,
      note: (form.get("note") as string | null) ?? "",
    });
    setBusy(false);
    setDone(result.ok ? { ok: true, text: DONE_WORDS[result.data.outcome] } : { ok: false, text: result.error.message });
  }

  return (
    <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
      {answer === "bats_seen" ? (
        <Field label="How many bats, roughly?" hint="Optional: count them as they fly out at dusk.">
          <Select name="countBand" defaultValue="">
            <option value="">I did not count</option>
            {COUNT_BANDS.map((band) => (
              <option key={band} value={band}>
                {COUNT_BAND_WORDS[band]}
              </option>
            ))}
          </Select>
        </Field>
      ) : null}
      <Field label="A note" hint="Optional.">
        <Textarea name="note" rows={2} maxLength={MAX_NOTE_CHARS} />
      </Field>
      <Button type="submit" loading={busy} className="self-start">
        Record this answer
      </Button>
      {done ? (
        <Alert tone={done.ok ? "good" : "poor"} live>
          {done.text}
        </Alert>
      ) : null}
    </form>
  );
}
