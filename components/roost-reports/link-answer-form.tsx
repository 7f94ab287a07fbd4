"use client";

import { useState, type FormEvent } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { Textarea } from "@/components/ui/textarea";
import { fetchJson, isApiError } from "@/lib/http/client";
import { COUNT_BAND_WORDS, COUNT_BANDS, type RoostAnswer } from "@/lib/roost-reports/answers";
import { MAX_NOTE_CHARS } from "@/lib/roost-reports/report-input";

const DONE_WORDS = {
  recorded: "Thank you: your answer is recorded.",
  changed: "Thank you: your answer is changed.",
  unchanged: "That was already your answer; nothing changed.",
} as const;

type Answered = { outcome: keyof typeof DONE_WORDS; others: { answer: RoostAnswer; label: string; href: string }[]; orderPath: string | null };

type Done =
  | { ok: true; text: string; others: { answer: RoostAnswer; label: string; href: string }[]; orderPath: string | null }
  | { ok: false; text: string };

/** The button that records an e-mail link's answer, with an optional count and note. */
export function LinkAnswerForm({ token, answer }: { token: string; answer: RoostAnswer }) {
  const [busy, setBusy] = useState(false);
  const [done, setDone] = useState<Done | null>(null);

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    setBusy(true);
    try {
      const answered = await fetchJson<Answered>("/api/roost-reports/answer", {
        json: {
          token,
          countBand: (form.get("countBand") as string | null) ?? undefined,
          note: (form.get("note") as string | null) ?? "",
        },
        fallbackMessage: "We could not record the answer just now. Please try again.",
      });
      setDone({ ok: true, text: DONE_WORDS[answered.outcome], others: answered.others, orderPath: answered.orderPath });
    } catch (error) {
      if (!isApiError(error)) throw error;
      setDone({ ok: false, text: error.message });
    } finally {
      setBusy(false);
    }
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
      {done?.ok ? null : (
        <Button type="submit" loading={busy} className="self-start">
          Record this answer
        </Button>
      )}
      {done ? (
        <Alert tone={done.ok ? "good" : "poor"} live>
          {done.text}
        </Alert>
      ) : null}
      {done?.ok ? (
        <nav aria-labelledby="change-answer" className="flex flex-col gap-2">
          <h3 id="change-answer" className="font-semibold text-ink">
            Saw something else? Change your answer
          </h3>
          <ul className="flex flex-col gap-1">
            {done.others.map((other) => (
              <li key={other.answer}>
                <a href={other.href} className="text-moss-800 underline underline-offset-2 hover:text-moss-900">
                  {other.label}
                </a>
              </li>
            ))}
            {done.orderPath ? (
              <li>
                <a href={done.orderPath} className="text-moss-800 underline underline-offset-2 hover:text-moss-900">
                  Your order page (to add a note or a photo)
                </a>
              </li>
            ) : null}
          </ul>
        </nav>
      ) : null}
    </form>
  );
}
