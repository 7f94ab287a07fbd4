import { ToneIcon } from "@/components/ui/tone-icon";
import { cautionsFor, MOVE_IN_PATIENCE } from "@/lib/safety/cautions";

/**
 * PRODUCT.md §7, shown wherever the planner talks about raising, mounting or moving a house.
 * The wording is the store's one copy in lib/safety/cautions.ts, shared with the e-mails; the
 * maternity months follow the checked site's hemisphere.
 */
export function PlacementCautions({ hemisphere = "north" }: { hemisphere?: "north" | "south" }) {
  return (
    <section
      aria-labelledby="placement-cautions"
      className="flex flex-col gap-3 rounded-2xl border border-l-4 border-ember-200 border-l-ember-600 bg-ember-50 p-5"
    >
      <h2
        id="placement-cautions"
        className="flex items-center gap-2 font-display text-xl font-semibold text-bark-900"
      >
        <ToneIcon tone="warn" className="size-5 text-ember-700" />
        Before you climb, dig or mount
      </h2>
      <ul className="flex flex-col gap-3">
        {cautionsFor({ hemisphere }).map((c) => (
          <li key={c.id} className="text-[0.9375rem] leading-relaxed text-bark-900">
            <span className="font-bold">{c.title}. </span>
            {c.text}
          </li>
        ))}
      </ul>
      <p className="border-t border-ember-200 pt-3 text-sm text-bark-800">
        <span className="font-bold">{MOVE_IN_PATIENCE.title}. </span>
        {MOVE_IN_PATIENCE.text}
      </p>
    </section>
  );
}
