import { houseKeyFor, isOccupiedAnswer, type RoostAnswer } from "./answers";
import type { HouseLine } from "./queries";
import { summerNumber } from "./season-rules";

// Which houses the end-of-season question and the two-summers advice go to (pure rules). The job
// that queues them is queueRoostReportMail in commands.ts.

export const ASK_KIND = "roost-report-ask";
export const ADVICE_KIND = "roost-report-advice";

type HouseRef = { orderLineId: string; unit: number };

export type CurrentReport = { houseKey: string; season: number; answer: RoostAnswer };

function unitsOf(line: HouseLine): HouseRef[] {
  return Array.from({ length: line.quantity }, (_, i) => ({ orderLineId: line.orderLineId, unit: i + 1 }));
}

/** The houses of an order to ask about in `season`: up for a whole summer, and not reported gone. */
export function housesToAsk({ lines, season, reports }: { lines: HouseLine[]; season: number; reports: CurrentReport[] }): HouseRef[] {
  const gone = new Set(reports.filter((r) => r.answer === "gone" && r.season < season).map((r) => r.houseKey));
  return lines.flatMap((line) => {
    if (!line.deliveredAt) return [];
    const summer = summerNumber({ season, deliveredAt: line.deliveredAt, hemisphere: line.hemisphere });
    if (summer === null || summer < 1) return [];
    return unitsOf(line).filter((h) => !gone.has(houseKeyFor(h)));
  });
}

/** Houses whose second summer was reported "no sign yet" and that never showed signs before. */
export function housesStillEmpty({ lines, season, reports }: { lines: HouseLine[]; season: number; reports: CurrentReport[] }): HouseRef[] {
  return lines.flatMap((line) => {
    if (!line.deliveredAt) return [];
    if (summerNumber({ season, deliveredAt: line.deliveredAt, hemisphere: line.hemisphere }) !== 2) return [];
    return unitsOf(line).filter((h) => {
      const mine = reports.filter((r) => r.houseKey === houseKeyFor(h) && r.season <= season);
      const thisSeason = mine.find((r) => r.season === season);
      return thisSeason?.answer === "no_sign" && !mine.some((r) => isOccupiedAnswer(r.answer));
    });
  });
}
