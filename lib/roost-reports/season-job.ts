import "server-only";
import { and, eq, inArray, ne } from "drizzle-orm";
import { getDb, type Tx } from "@/db/client";
import { outbox, roostAskOptOuts, roostReports } from "@/db/schema";
import { enqueueEmail } from "@/lib/mail/commands/outbox";
import { houseKeyFor, isOccupiedAnswer, type RoostAnswer } from "./answers";
import { loadHouseLines, type HouseLine } from "./house-context";
import { seasonLabel, seasonToAdvise, seasonToAsk, summerNumber } from "./season-rules";

// The end-of-season questions and the two-summers advice. Run once a day by the background
// runner (lib/mail/background-jobs.ts). Idempotent however often it runs and in however many
// app instances: one message per order per season, by the outbox dedupe keys
// `roost-ask:<season>:<orderId>` and `roost-advice:<season>:<orderId>`.

export const ASK_KIND = "roost-report-ask";
export const ADVICE_KIND = "roost-report-advice";

type HouseRef = { orderLineId: string; unit: number };

type CurrentReport = { houseKey: string; season: number; answer: RoostAnswer };

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

async function currentReportsFor(tx: Tx, lines: HouseLine[]): Promise<CurrentReport[]> {
  const ids = lines.map((l) => l.orderLineId);
  if (ids.length === 0) return [];
  return tx
    .select({ houseKey: roostReports.houseKey, season: roostReports.season, answer: roostReports.answer })
    .from(roostReports)
    .where(and(inArray(roostReports.orderLineId, ids), eq(roostReports.current, true), ne(roostReports.review, "doubtful")));
}

export async function queueRoostReportMail({ now = new Date() }: { now?: Date } = {}): Promise<{ asked: number; advised: number }> {
  const db = await getDb();
  return db.transaction(async (tx) => {
    const lines = await loadHouseLines({ db: tx, arrivedOnly: true });
    const optedOut = new Set((await tx.select({ email: roostAskOptOuts.email }).from(roostAskOptOuts)).map((r) => r.email));
    const reports = await currentReportsFor(tx, lines);
    const byOrder = new Map<string, HouseLine[]>();
    for (const line of lines) byOrder.set(line.orderId, [...(byOrder.get(line.orderId) ?? []), line]);
    let asked = 0;
    let advised = 0;
    for (const [orderId, orderLines] of byOrder) {
      const first = orderLines[0]!;
      if (optedOut.has(first.email.toLowerCase())) continue;
      const hemisphere = first.hemisphere;
      const askSeason = seasonToAsk({ date: now, hemisphere });
      if (askSeason !== null) {
        const houses = housesToAsk({ lines: orderLines, season: askSeason, reports });
        if (houses.length > 0) {
          const inserted = await enqueueEmailCounted(tx, {
            dedupeKey: `roost-ask:${askSeason}:${orderId}`,
            kind: ASK_KIND,
            to: first.email,
            subject: `Did bats move in? Your bat ${houses.length === 1 ? "house" : "houses"}, summer ${seasonLabel({ season: askSeason, hemisphere })}`,
            payload: { orderId, season: askSeason, houses },
          });
          asked += inserted;
        }
      }
      const adviseSeason = seasonToAdvise({ date: now, hemisphere });
      if (adviseSeason !== null) {
        const houses = housesStillEmpty({ lines: orderLines, season: adviseSeason, reports });
        if (houses.length > 0) {
          advised += await enqueueEmailCounted(tx, {
            dedupeKey: `roost-advice:${adviseSeason}:${orderId}`,
            kind: ADVICE_KIND,
            to: first.email,
            subject: "Still waiting for bats? Two changes that help",
            payload: { orderId, season: adviseSeason, houses },
          });
        }
      }
    }
    return { asked, advised };
  });
}

/** enqueueEmail, telling whether this call wrote the row (1) or the dedupe key already held it (0). */
async function enqueueEmailCounted(tx: Tx, message: Parameters<typeof enqueueEmail>[1]): Promise<number> {
  const before = await tx.select({ id: outbox.id }).from(outbox).where(eq(outbox.dedupeKey, message.dedupeKey));
  if (before.length > 0) return 0;
  await enqueueEmail(tx, message);
  return 1;
}
