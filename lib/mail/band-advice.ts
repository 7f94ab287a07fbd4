import { CLIMATE_BANDS, type BandId } from "@/lib/catalog/climate-bands";
import { displayClimateValue } from "@/lib/climate/display";
import { MONTH_WORDS } from "@/lib/climate/warmest-month";
import { getSunRegime, MORNING_SHARE_MIN } from "@/lib/placement/sun-rule";
import type { GuideClimate, GuideItem } from "./install-guide-types";

// What a climate band means for the house: shade, vents, sun hours and afternoon shade.
// Sources: PRODUCT.md §2 (shades and vents: the colour guidance keyed to the average July high,
// Tuttle, Kiser & Kiser, The Bat House Builder's Handbook, 2004; vents where July highs average
// 85 °F or more, Bat Conservation of Wisconsin) and §4 P4 (sun hours; lib/placement/sun-rule.ts).

/** Sun hours wanted on the house face (P4): the figure depends on the July high, not only the band. */
export function describeSunWanted({
  bandId,
  julyHighF,
}: {
  bandId: BandId;
  julyHighF: number | null;
}): string {
  if (bandId === "very-hot") {
    return `Give it at least 4 hours of direct sun a day, mostly in the morning (${Math.round(MORNING_SHARE_MIN * 100)}% or more before midday), and shade in the afternoon.`;
  }
  if (bandId === "cool") {
    const mild = julyHighF === null || getSunRegime(julyHighF) === "mild";
    return mild
      ? "Give it more sun, as much as the spot allows: at least 10 hours of direct sun a day where July highs stay at or below 80 °F (27 °C), and never less than 6."
      : "Give it more sun, as much as the spot allows: at least 6 hours of direct sun a day, and more is better where summers are this mild.";
  }
  return "Give it at least 6 hours of direct sun a day, the morning sun above all (6 to 8 hours of morning sun is ideal).";
}

// Why each band's shades suit it: the handbook's colour guidance (see lib/catalog/climate-bands.ts).
const SHADE_REASONS: Record<BandId, string> = {
  cool: "dark shades soak up the sun's warmth that mothers and pups need",
  warm: "they hold enough warmth without overheating",
  hot: "lighter shades reflect the sun and keep the chambers from overheating",
  "very-hot": "light shades reflect the sun and keep the chambers from overheating",
};

function describeShades({ bandId }: { bandId: BandId }): string {
  const band = CLIMATE_BANDS[bandId];
  const [first, second] = band.shades;
  return `${band.label} call for a ${first} or ${second} outside: ${SHADE_REASONS[bandId]}.`;
}

function describeVents({ bandId }: { bandId: BandId }): string {
  return CLIMATE_BANDS[bandId].ventsNeeded
    ? "Vents are needed where July highs reach 85 °F (29.4 °C): a vent about 6 in (15 cm) above the bottom lets bats move to a cooler spot on hot days. Keep it open."
    : "Vents are optional where summers stay this cool; a house without them stays warmer.";
}

export function climateSection(climate: GuideClimate): {
  heading: string;
  paragraphs: string[];
  advice: GuideItem[];
} {
  if (!climate.known) {
    return {
      heading: "Shade and vents for your summers",
      paragraphs: [
        climate.reason,
        "Match the outside to the average daily high of your warmest month (July north of the equator, January south of it): below 85 °F black or dark; 85 to 95 °F dark or medium, vented; 95 to 100 °F medium or light, vented; 100 °F and above light or white, vented, with afternoon shade.",
      ],
      advice: [],
    };
  }
  const band = CLIMATE_BANDS[climate.bandId];
  // Rounded so it never contradicts the band (84.96 °F reads "about 84 °F", cool summers).
  const shown = climate.julyHighF === null ? null : displayClimateValue(climate.julyHighF, band);
  const month = MONTH_WORDS[climate.warmestMonth ?? "july"];
  const high = shown === null ? "" : ` (average daily high in ${month}, your warmest month, about ${shown.wholeF} °F, ${shown.wholeC} °C)`;
  const advice: GuideItem[] = [
    { topic: "Shade", text: describeShades({ bandId: climate.bandId }) },
    { topic: "Vents", text: describeVents({ bandId: climate.bandId }) },
    {
      topic: "Sun",
      text: describeSunWanted({ bandId: climate.bandId, julyHighF: climate.julyHighF }),
    },
  ];
  if (band.afternoonShade) {
    advice.push({
      topic: "Afternoon shade",
      text: "Where July highs pass 100 °F, pick a spot where a building or trees shade the house from early afternoon, or the chambers can grow too hot for pups.",
    });
  }
  const paragraphs = [
    `From ${climate.basis}: ${band.label.toLowerCase()}${high}. ${band.explanation}`,
  ];
  if (climate.nearEdgeNote) paragraphs.push(climate.nearEdgeNote);
  return { heading: `Shade and vents for ${band.label.toLowerCase()}`, paragraphs, advice };
}
