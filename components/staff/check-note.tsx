import { cn } from "@/components/ui/cn";
import { ToneIcon, type Tone } from "@/components/ui/tone-icon";
import type { DraftResult } from "@/lib/staff/draft-check";

const LOOK: Record<DraftResult["status"], { tone: Tone; word: string; box: string }> = {
  pass: { tone: "good", word: "Meets", box: "border-moss-200 bg-moss-50 text-moss-900" },
  note: { tone: "fair", word: "Note", box: "border-ember-200 bg-ember-50 text-bark-900" },
  fail: { tone: "poor", word: "Does not meet", box: "border-berry-200 bg-berry-50 text-berry-900" },
  waiting: { tone: "neutral", word: "Waiting", box: "border-paper-300 bg-paper-100 text-ink-soft" },
};

/** One criterion's verdict, shown beside the field it reads. */
export function CheckNote({
  result,
  id,
  className,
}: {
  result: DraftResult;
  id?: string;
  className?: string;
}) {
  const look = LOOK[result.status];
  return (
    <div
      id={id}
      className={cn("flex gap-2 rounded-lg border px-3 py-2 text-sm", look.box, className)}
      data-criterion={result.id}
      data-status={result.status}
    >
      <ToneIcon tone={look.tone} className="mt-0.5 size-4" />
      <p className="min-w-0">
        <span className="font-bold">
          {look.word} · {result.id} {result.kind === "required" ? "(required)" : "(advisory)"}
        </span>
        <span className="block">{result.reason}</span>
        <span className="mt-0.5 block text-xs">Rule: {result.rule}</span>
      </p>
    </div>
  );
}
