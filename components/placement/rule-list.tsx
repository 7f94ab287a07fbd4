import { Badge } from "@/components/ui/badge";
import type { RuleResult, RuleStatus } from "@/lib/placement/types";

export const STATUS_WORDS: Record<RuleStatus, string> = {
  good: "Good",
  fair: "Fair",
  poor: "Poor",
};

/** The ten placement rules, each with its status, the site's value, why, and what to change. */
export function RuleList({ rules }: { rules: readonly RuleResult[] }) {
  return (
    <ol className="flex flex-col divide-y divide-paper-200 rounded-2xl border border-paper-300 bg-paper-50 shadow-card">
      {rules.map((rule) => (
        <li
          key={rule.id}
          className="flex flex-col gap-1.5 p-4"
          data-rule={rule.id}
          data-status={rule.status}
        >
          <div className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1">
            <h3 className="text-base font-bold text-ink">{rule.name}</h3>
            <Badge tone={rule.status}>{STATUS_WORDS[rule.status]}</Badge>
          </div>
          <p className="text-sm text-ink-soft">{rule.value}</p>
          <p>{rule.reason}</p>
          {rule.change ? (
            <p className="rounded-lg bg-ember-50 px-3 py-2 text-[0.9375rem]">
              <span className="font-bold">What to change: </span>
              {rule.change}
            </p>
          ) : null}
          <p className="text-xs text-ink-soft">Source: {rule.source}</p>
        </li>
      ))}
    </ol>
  );
}
