"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { reviewRoostReportAction } from "@/lib/roost-reports/actions";
import { ANSWER_WORDS, COUNT_BAND_WORDS, isOccupiedAnswer, type CountBand, type RoostAnswer } from "@/lib/roost-reports/answers";
import { reportPhotoUrl } from "@/lib/roost-reports/photo-keys";

export type ReviewCardData = {
  id: string;
  modelName: string;
  unit: number;
  seasonLabel: string;
  summer: number;
  answer: RoostAnswer;
  countBand: CountBand | null;
  note: string;
  photo: { keyBase: string; widths: number[] } | null;
  bandLabel: string | null;
  mount: string | null;
  state: string | null;
  reporterWords: string;
  review: "new" | "accepted" | "doubtful" | "follow_up";
  reviewReason: string;
  reviewerName: string | null;
  demo: boolean;
  reportedOn: string;
};

const REVIEW_WORDS = { new: "New", accepted: "Looks right", doubtful: "Doubtful: not counted", follow_up: "To follow up" } as const;
const REVIEW_TONES = { new: "info", accepted: "good", doubtful: "poor", follow_up: "warn" } as const;

/** One report to review: what was said, the photo, and the three decisions. */
export function ReviewCard({ report }: { report: ReviewCardData }) {
  const router = useRouter();
  const [reason, setReason] = useState(report.reviewReason);
  const [busy, setBusy] = useState<string | null>(null);
  const [error, setError] = useState<{ message: string; field?: string } | null>(null);

  async function decide(decision: "accepted" | "doubtful" | "follow_up") {
    setBusy(decision);
    setError(null);
    const result = await reviewRoostReportAction({ reportId: report.id, decision, reason });
    setBusy(null);
    if (!result.ok) return setError({ message: result.error.message, field: result.error.fields?.reason });
    router.refresh();
  }

  const headingId = `report-${report.id}`;
  return (
    <article aria-labelledby={headingId} className="flex flex-col gap-3 rounded-xl border border-paper-300 bg-white p-5 shadow-card" data-testid="review-card">
      <div className="flex flex-wrap items-center gap-2">
        <h3 id={headingId} className="font-display text-lg font-semibold text-moss-900">
          {report.modelName}
          {report.unit > 1 ? ` (house ${report.unit} of its order)` : ""}: summer {report.seasonLabel}
        </h3>
        <Badge tone={REVIEW_TONES[report.review]}>{REVIEW_WORDS[report.review]}</Badge>
        {report.demo ? <Badge tone="neutral">Demo</Badge> : null}
      </div>
      <div className="grid gap-4 sm:grid-cols-[1fr_auto]">
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
          <dt className="text-ink-soft">Answer</dt>
          <dd className={isOccupiedAnswer(report.answer) ? "font-bold text-moss-800" : "font-bold"}>
            {ANSWER_WORDS[report.answer].label}
            {report.countBand ? ` (${COUNT_BAND_WORDS[report.countBand].toLowerCase()})` : ""}
          </dd>
          <dt className="text-ink-soft">Summer of the house</dt>
          <dd>{report.summer === 0 ? "Went up late in this season" : `Summer ${report.summer}`}</dd>
          <dt className="text-ink-soft">Summers, mount, state</dt>
          <dd>{[report.bandLabel ?? "band unknown", report.mount ?? "mount unknown", report.state ?? "state unknown"].join(" · ")}</dd>
          <dt className="text-ink-soft">Reported</dt>
          <dd>
            {report.reportedOn}, {report.reporterWords}
          </dd>
          {report.note ? (
            <>
              <dt className="text-ink-soft">Note</dt>
              <dd className="whitespace-pre-line">{report.note}</dd>
            </>
          ) : null}
          {report.review !== "new" && report.reviewReason ? (
            <>
              <dt className="text-ink-soft">Reason</dt>
              <dd>
                {report.reviewReason}
                {report.reviewerName ? ` (${report.reviewerName})` : ""}
              </dd>
            </>
          ) : null}
        </dl>
        {report.photo ? (
          // eslint-disable-next-line @next/next/no-img-element -- served by the staff-only route, not the public image optimizer
          <img src={reportPhotoUrl(report.photo, 320)} alt={`Photo sent with the report on ${report.modelName}, house ${report.unit}`} className="w-40 rounded-lg border border-paper-200" />
        ) : null}
      </div>
      <Field label="Reason or follow-up note" hint="Needed to mark a report doubtful; kept with it." error={error?.field}>
        <Input value={reason} onChange={(e) => setReason(e.target.value)} maxLength={500} />
      </Field>
      <div className="flex flex-wrap gap-2">
        <Button size="sm" onClick={() => void decide("accepted")} loading={busy === "accepted"} disabled={busy !== null}>
          {report.review === "doubtful" ? "Count it again" : "Looks right"}
        </Button>
        <Button size="sm" variant="secondary" onClick={() => void decide("follow_up")} loading={busy === "follow_up"} disabled={busy !== null}>
          Follow up
        </Button>
        <Button size="sm" variant="danger" onClick={() => void decide("doubtful")} loading={busy === "doubtful"} disabled={busy !== null}>
          Doubtful: leave out of figures
        </Button>
      </div>
      {error && !error.field ? (
        <Alert tone="poor" live>
          {error.message}
        </Alert>
      ) : null}
    </article>
  );
}
