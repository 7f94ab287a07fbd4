import { cn } from "@/components/ui/cn";
import { ToneIcon } from "@/components/ui/tone-icon";
import type { DraftCheck } from "@/lib/staff/draft-check";
import { DESIGN_CRITERIA } from "@/lib/catalog/design-criteria";

const ICON = { pass: "good", note: "fair", fail: "poor", waiting: "neutral" } as const;
const COLOR = {
  pass: "text-moss-700",
  note: "text-ember-800",
  fail: "text-berry-700",
  waiting: "text-bark-500",
} as const;

export function summaryLine(check: DraftCheck): string {
  const failing = check.results.filter((r) => r.kind === "required" && r.status === "fail").length;
  const waiting = check.results.filter((r) => r.status === "waiting").length;
  const notes = `${check.notes} ${check.notes === 1 ? "note" : "notes"}`;
  if (failing > 0)
    return `${failing} required ${failing === 1 ? "criterion does" : "criteria do"} not meet our rules · ${notes}`;
  if (check.publishable === null)
    return `${waiting} ${waiting === 1 ? "criterion is" : "criteria are"} waiting for a value · ${notes}`;
  return `Every required criterion is met · ${notes}`;
}

/** All eleven criteria at a glance, beside the form; the one-line summary is announced politely. */
export function DesignCheckSummary({
  check,
  className,
}: {
  check: DraftCheck;
  className?: string;
}) {
  return (
    <section
      aria-labelledby="design-check-title"
      className={cn("rounded-2xl border border-paper-300 bg-paper-50 p-5 shadow-card", className)}
    >
      <h2 id="design-check-title" className="font-display text-xl font-semibold text-moss-900">
        Design check
      </h2>
      <p
        aria-live="polite"
        className="mt-1 text-sm font-bold text-ink"
        data-testid="design-check-summary"
      >
        {summaryLine(check)}
      </p>
      <ul className="mt-3 flex flex-col gap-1.5 text-sm">
        {check.results.map((r) => (
          <li key={r.id} className="flex items-start gap-2">
            <ToneIcon tone={ICON[r.status]} className={cn("mt-0.5 size-4", COLOR[r.status])} />
            <span>
              <span className="font-bold">{r.id}</span> {DESIGN_CRITERIA[r.id].title}
              <span className="text-ink-soft">
                {" "}
                ·{" "}
                {r.status === "waiting"
                  ? "waiting"
                  : r.status === "pass"
                    ? "meets"
                    : r.status === "note"
                      ? "note"
                      : "does not meet"}
              </span>
            </span>
          </li>
        ))}
      </ul>
      <p className="mt-3 text-xs text-ink-soft">
        The same check runs on the server when you save and publish. Required criteria must all be
        met before a model goes on sale.
      </p>
    </section>
  );
}
