import { CLIMATE_BANDS, type BandId } from "./climate-bands";
import type { HouseSpec } from "./spec";
import { SHADE_LABELS, SHADES, type Shade } from "./spec-words";
import type { Rating } from "@/lib/shared/rating";

// How well a model suits a buyer's climate band (product brief §3). Steps count along the shade
// scale black → dark → medium → light → white to the nearest shade that suits the band.
// Source: the colour-by-July-high guidance of Tuttle, Kiser & Kiser, The Bat House Builder's
// Handbook (2004), as reproduced by agencies; one step off is fixable with paint, further is not
// a good match (common practice, no source).

export type FitLabel = Rating;

export type Fit = { label: FitLabel; steps: number; repaintTo?: Shade; reasons: string[] };

/** Our own words for the three labels, shown on cards and model pages. */
export const FIT_LABEL_WORDS: Record<FitLabel, string> = {
  good: "Suits your summers",
  fair: "Suits with a repaint",
  poor: "Not for your summers",
};

type FitInput = Pick<HouseSpec, "exteriorShade" | "vented">;

function nearestSuitableShade(
  shade: Shade,
  suitable: readonly Shade[],
): { to: Shade; steps: number } {
  const from = SHADES.indexOf(shade);
  let best: { to: Shade; steps: number } | null = null;
  for (const candidate of suitable) {
    const steps = Math.abs(SHADES.indexOf(candidate) - from);
    if (!best || steps < best.steps) best = { to: candidate, steps };
  }
  if (!best) throw new Error("A climate band must list at least one suitable shade.");
  return best;
}

export function fitForBand({ exteriorShade, vented }: FitInput, bandId: BandId): Fit {
  const band = CLIMATE_BANDS[bandId];
  const { to, steps } = nearestSuitableShade(exteriorShade, band.shades);
  const missingVents = band.ventsNeeded && !vented;
  const reasons: string[] = [];

  if (steps === 0) {
    reasons.push(`A ${exteriorShade} outside suits ${band.label.toLowerCase()}.`);
  } else if (steps === 1) {
    reasons.push(
      `Its ${exteriorShade} outside is one shade off for ${band.label.toLowerCase()}; repaint it ${SHADE_LABELS[to].toLowerCase()} to suit.`,
    );
  } else {
    const warmer = SHADES.indexOf(exteriorShade) < SHADES.indexOf(to);
    reasons.push(
      warmer
        ? `Its ${exteriorShade} outside would run too hot for ${band.label.toLowerCase()}; ${band.shades.join(" or ")} suits.`
        : `Its ${exteriorShade} outside would stay too cool for ${band.label.toLowerCase()}; ${band.shades.join(" or ")} suits.`,
    );
  }
  if (missingVents) {
    reasons.push("It has no vents, and houses need them where July highs reach 85 °F or more.");
  }
  if (band.afternoonShade) {
    reasons.push("Where summers are this hot, hang it where it gets shade in the afternoon.");
  }

  const label: FitLabel =
    steps === 0 && !missingVents ? "good" : steps === 1 && !missingVents ? "fair" : "poor";
  return steps === 0 ? { label, steps, reasons } : { label, steps, repaintTo: to, reasons };
}
