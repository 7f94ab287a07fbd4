import type { Metadata } from "next";
import { BandFinder } from "@/components/catalog/band-finder";
import { PageHeader, PageShell } from "@/components/page-header";
import { BAND_IDS, CLIMATE_BANDS } from "@/lib/catalog/climate-bands";
import { SOURCE_NAMES } from "@/lib/catalog/design-criteria";
import { SHADE_LABELS } from "@/lib/catalog/spec";

export const metadata: Metadata = { title: "Your climate band" };

export default function ClimatePage() {
  return (
    <PageShell>
      <PageHeader
        title="What are your summers like?"
        lead="A bat house has to stay warm enough for mothers and pups without overheating. How hot your July days get decides the outside shade and whether the house needs vents."
      />
      <div className="grid gap-10 lg:grid-cols-[1.2fr_1fr]">
        <BandFinder />
        <section aria-labelledby="bands" className="flex flex-col gap-3">
          <h2 id="bands" className="font-display text-2xl font-semibold text-moss-900">
            The four bands
          </h2>
          <ul className="flex flex-col gap-3">
            {BAND_IDS.map((id) => {
              const b = CLIMATE_BANDS[id];
              return (
                <li key={id} className="rounded-lg border border-paper-200 bg-white p-4">
                  <p className="font-bold">{b.label}</p>
                  <p className="text-sm text-ink-soft">{b.rangeText}</p>
                  <p className="text-sm">
                    Shades: {b.shades.map((s) => SHADE_LABELS[s]).join(", ")} · Vents {b.ventsNeeded ? "needed" : "optional"}
                    {b.afternoonShade ? " · afternoon shade" : ""}
                  </p>
                </li>
              );
            })}
          </ul>
          <p className="text-sm text-ink-soft">
            Colour guidance keyed to the average July high, as reproduced by wildlife agencies; vents where July highs
            average 85 °F or more. Sources: {SOURCE_NAMES.handbook}; {SOURCE_NAMES.stateGroup}.
          </p>
        </section>
      </div>
    </PageShell>
  );
}
