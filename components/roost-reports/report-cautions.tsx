import { cautionsFor } from "@/lib/roost-reports/cautions";
import type { Hemisphere } from "@/lib/roost-reports/season-rules";

/** The cautions (lib/safety) beside a question that sends someone to look at their house. */
export function ReportCautions({ hemisphere = "north" }: { hemisphere?: Hemisphere }) {
  return (
    <details open className="rounded-xl border border-l-4 border-ember-200 border-l-ember-600 bg-ember-50 p-4 text-bark-900">
      <summary className="cursor-pointer font-bold">Before you look: stay safe around the house</summary>
      <p className="mt-2 text-sm">Look from the ground, at dusk or by day. There is no need to open, climb to or touch the house.</p>
      <ul className="mt-2 flex flex-col gap-2 text-sm">
        {cautionsFor({ hemisphere }).map((c) => (
          <li key={c.id}>
            <span className="font-bold">{c.title}. </span>
            {c.text}
          </li>
        ))}
      </ul>
    </details>
  );
}
