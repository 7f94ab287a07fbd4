"use client";

import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Select } from "@/components/ui/select";
import { Textarea } from "@/components/ui/textarea";
import { fetchJson, isApiError } from "@/lib/http/client";
import { ANSWER_WORDS, COUNT_BAND_WORDS, COUNT_BANDS, isOccupiedAnswer, ROOST_ANSWERS, type RoostAnswer } from "@/lib/roost-reports/answers";
import type { HouseQuestion } from "@/lib/roost-reports/queries";
import { MAX_NOTE_CHARS, MOUNT_CHOICES } from "@/lib/roost-reports/report-input";
import { ACCEPT_ATTRIBUTE, MAX_UPLOAD_BYTES, checkFileSize } from "@/lib/uploads/upload-rules";

const MOUNT_WORDS: Record<(typeof MOUNT_CHOICES)[number], string> = { pole: "On a pole", building: "On a building wall", tree: "On a tree" };
const OUTCOME_WORDS = { recorded: "Thank you: your answer is saved.", changed: "Thank you: your answer is changed.", unchanged: "That is already your answer; nothing changed." };

type Result = { tone: "good" | "poor"; text: string } | null;

/** One house's question: what did you see this season? With an optional count, note and photo. */
export function HouseReportForm({ question, orderId, accessToken }: { question: HouseQuestion; orderId: string; accessToken?: string }) {
  const router = useRouter();
  const [answer, setAnswer] = useState<RoostAnswer | "">(question.current?.answer ?? "");
  const [busy, setBusy] = useState(false);
  const [result, setResult] = useState<Result>(null);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const id = `${question.orderLineId}-${question.unit}`;
  const title = question.quantity > 1 ? `${question.modelName}, house ${question.unit} of ${question.quantity}` : question.modelName;

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const photo = form.get("photo");
    if (photo instanceof File && photo.size > 0) {
      const size = checkFileSize(photo.size);
      if (!size.ok) return setErrors({ photo: size.message });
    }
    if (!answer) return setErrors({ answer: "Choose what you saw this season." });
    form.set("orderLineId", question.orderLineId);
    form.set("unit", String(question.unit));
    form.set("season", String(question.season));
    if (accessToken) form.set("t", accessToken);
    setBusy(true);
    setErrors({});
    setResult(null);
    try {
      const body = await fetchJson<{ outcome?: keyof typeof OUTCOME_WORDS }>(`/api/orders/${orderId}/roost-reports`, {
        method: "POST",
        body: form,
        fallbackMessage: "Your answer could not be saved. Please try again.",
      });
      if (!body?.outcome) {
        setErrors({});
        setResult({ tone: "poor", text: "Your answer could not be saved. Please try again." });
        return;
      }
      setResult({ tone: "good", text: OUTCOME_WORDS[body.outcome] });
      router.refresh();
    } catch (error) {
      if (isApiError(error) && error.status !== 0) {
        setErrors(error.fields ?? {});
        setResult({ tone: "poor", text: error.message });
        return;
      }
      setResult({ tone: "poor", text: "We could not reach the store. Check your connection and try again." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4 rounded-xl border border-paper-200 bg-white p-5" aria-labelledby={`${id}-title`} data-testid="house-report">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 id={`${id}-title`} className="font-display text-lg font-semibold text-moss-900">
          {title}
        </h3>
        {question.current ? (
          <Badge tone={isOccupiedAnswer(question.current.answer) ? "good" : "neutral"}>
            {ANSWER_WORDS[question.current.answer].label}
            {question.current.countBand ? ` (${COUNT_BAND_WORDS[question.current.countBand].toLowerCase()})` : ""}
          </Badge>
        ) : (
          <Badge tone="info">Not answered yet</Badge>
        )}
      </div>
      <fieldset className="flex flex-col gap-2" aria-describedby={errors.answer ? `${id}-answer-error` : undefined}>
        <legend className="mb-1 font-bold">
          Summer {question.seasonLabel}
          {question.summer > 0 ? ` (its ${ordinal(question.summer)} summer)` : " (it went up late in the season)"}: what did you see?
        </legend>
        {ROOST_ANSWERS.map((value) => (
          <label key={value} className="flex cursor-pointer items-start gap-3 rounded-lg border border-paper-200 p-3 has-[:checked]:border-moss-600 has-[:checked]:bg-moss-50">
            <input type="radio" name="answer" value={value} checked={answer === value} onChange={() => setAnswer(value)} className="mt-1 size-4 accent-moss-700" />
            <span>
              <span className="font-bold">{ANSWER_WORDS[value].label}</span>
              <span className="block text-sm text-ink-soft">{ANSWER_WORDS[value].detail}</span>
            </span>
          </label>
        ))}
        {errors.answer ? (
          <p id={`${id}-answer-error`} className="text-sm font-bold text-berry-700">
            {errors.answer}
          </p>
        ) : null}
      </fieldset>
      {answer === "bats_seen" ? (
        <Field label="How many bats, roughly?" hint="Count them as they fly out at dusk; a rough band is fine." error={errors.countBand}>
          <Select name="countBand" defaultValue={question.current?.countBand ?? ""}>
            <option value="">I did not count</option>
            {COUNT_BANDS.map((band) => (
              <option key={band} value={band}>
                {COUNT_BAND_WORDS[band]}
              </option>
            ))}
          </Select>
        </Field>
      ) : null}
      <Field label="How is the house mounted?" hint={question.siteMount ? "From your saved site; change it if the house went elsewhere." : "Optional: it helps the figures by mount."} error={errors.mount}>
        <Select name="mount" defaultValue={question.siteMount ?? ""}>
          <option value="">Not saying</option>
          {MOUNT_CHOICES.map((m) => (
            <option key={m} value={m}>
              {MOUNT_WORDS[m]}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="A note" hint="Optional: anything that helps, such as when you saw them." error={errors.note}>
        <Textarea name="note" rows={2} maxLength={MAX_NOTE_CHARS} defaultValue={question.current?.note ?? ""} />
      </Field>
      <Field
        id={`${id}-photo`}
        label="A photo"
        hint={`Optional: droppings below the house or bats at the entrance. JPEG, PNG or WebP up to ${MAX_UPLOAD_BYTES / (1024 * 1024)} MB. Only our workshop staff see it.${question.current?.hasPhoto ? " A photo is already attached." : ""}`}
        error={errors.photo ?? errors.file}
      >
        {/* A bare file input, so Field's label is tied to it by the id given above. */}
        <input
          id={`${id}-photo`}
          aria-describedby={[`${id}-photo-hint`, errors.photo ?? errors.file ? `${id}-photo-error` : ""].filter(Boolean).join(" ")}
          aria-invalid={errors.photo ?? errors.file ? true : undefined}
          type="file"
          name="photo"
          accept={ACCEPT_ATTRIBUTE}
          className="text-sm file:mr-3 file:rounded-lg file:border file:border-paper-300 file:bg-paper-50 file:px-3 file:py-2 file:font-bold" />
      </Field>
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={busy}>
          {busy ? "Saving…" : question.current ? "Change my answer" : "Save my answer"}
        </Button>
      </div>
      {result ? (
        <Alert tone={result.tone} live>
          {result.text}
        </Alert>
      ) : null}
      {question.history.length > 1 || (question.history.length === 1 && !question.history[0]!.current) ? (
        <details className="text-sm">
          <summary className="cursor-pointer font-bold text-moss-800">Earlier answers</summary>
          <ul className="mt-2 flex flex-col gap-1 text-ink-soft">
            {question.history.map((h) => (
              <li key={`${h.season}-${h.reportedAt}`}>
                Summer {h.seasonLabel}: {ANSWER_WORDS[h.answer].label}
                {h.countBand ? ` (${COUNT_BAND_WORDS[h.countBand].toLowerCase()})` : ""}, {new Date(h.reportedAt).toLocaleDateString("en-US", { dateStyle: "medium", timeZone: "UTC" })}
                {h.current ? "" : " (changed since)"}
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </form>
  );
}

function ordinal(n: number): string {
  return ["first", "second", "third", "fourth", "fifth"][n - 1] ?? `${n}th`;
}
