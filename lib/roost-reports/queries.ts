import "server-only";
import { and, asc, desc, eq, inArray, ne, sql, type SQL } from "drizzle-orm";
import { getDb, type DbOrTx } from "@/db/client";
import { houseModels, orderEvents, orderLines, orders, roostAskOptOuts, roostReportLinkUses, roostReports, sites, users } from "@/db/schema";
import { BAND_IDS, CLIMATE_BANDS, type BandId } from "@/lib/catalog/climate-bands";
import { houseKeyFor, type CountBand, type RoostAnswer } from "./answers";
import {
  firstOccupancy,
  houseOutcomes,
  MIN_HOUSES_FOR_RATE,
  occupancyBy,
  occupancyStat,
  publicStat,
  SUMMERS_WINDOW,
  type HouseOutcome,
  type ReportFact,
} from "./occupancy-rules";
import { currentSeason, hemisphereOf, seasonLabel, summerNumber, type Hemisphere } from "./season-rules";
import { RATINGS } from "@/lib/shared/rating";

export const VOLUNTARY_CAVEAT =
  "These figures come only from buyers who chose to answer our end-of-season questions, so they are not a survey of every house sold; houses whose owners answered may do better or worse than the rest.";
export const DEMO_NOTE = "Demo figures: the reports behind them are invented, to show how this works.";

const MOUNT_LABELS: Record<string, string> = { pole: "On a pole", building: "On a building wall", tree: "On a tree" };
const RATING_LABELS: Record<string, string> = { good: "Sites rated good", fair: "Sites rated fair", poor: "Sites rated poor" };

/** Every current report that counts (not marked doubtful), with the model's slug and name. */
async function listCountedFacts(filter?: { modelId?: string }) {
  const db = await getDb();
  const rows = await db
    .select({
      houseKey: roostReports.houseKey,
      modelId: roostReports.modelId,
      slug: houseModels.slug,
      modelName: houseModels.name,
      season: roostReports.season,
      summer: roostReports.summer,
      answer: roostReports.answer,
      bandId: roostReports.bandId,
      mount: roostReports.mount,
      state: roostReports.state,
      siteRating: roostReports.siteRating,
      demo: roostReports.demo,
    })
    .from(roostReports)
    .innerJoin(houseModels, eq(houseModels.id, roostReports.modelId))
    .where(
      and(
        eq(roostReports.current, true),
        ne(roostReports.review, "doubtful"),
        filter?.modelId ? eq(roostReports.modelId, filter.modelId) : undefined,
      ),
    );
  return rows;
}

export type PublicStat = ReturnType<typeof publicStat>;

export type ModelOccupancy = {
  minimumHouses: number;
  summersWindow: number;
  caveat: string;
  demo: boolean;
  demoNote: string | null;
  overall: PublicStat;
  byBand: (PublicStat & { bandId: BandId; label: string })[];
  byMount: (PublicStat & { mount: string; label: string })[];
  firstOccupancy: ReturnType<typeof firstOccupancy> | null;
};

function toModelOccupancy(outcomes: HouseOutcome[]): ModelOccupancy {
  const overall = occupancyStat(outcomes);
  const bands = occupancyBy(outcomes, (o) => o.bandId);
  const mounts = occupancyBy(outcomes, (o) => o.mount);
  const demo = outcomes.some((o) => o.demo);
  const first = firstOccupancy(outcomes);
  return {
    minimumHouses: MIN_HOUSES_FOR_RATE,
    summersWindow: SUMMERS_WINDOW,
    caveat: VOLUNTARY_CAVEAT,
    demo,
    demoNote: demo ? DEMO_NOTE : null,
    overall: publicStat(overall),
    byBand: BAND_IDS.filter((id) => bands.has(id)).map((id) => ({ bandId: id, label: CLIMATE_BANDS[id].label, ...publicStat(bands.get(id)!) })),
    byMount: ["pole", "building", "tree"]
      .filter((m) => mounts.has(m))
      .map((m) => ({ mount: m, label: MOUNT_LABELS[m]!, ...publicStat(mounts.get(m)!) })),
    // Time to first occupancy is shown on the same terms as the rate: only from 5 houses known.
    firstOccupancy: overall.shown ? first : null,
  };
}

/** The public figures of one model: by band and by mount, n always, rates only where n ≥ 5. */
export async function getModelOccupancy({ modelId }: { modelId: string }): Promise<ModelOccupancy> {
  const facts = await listCountedFacts({ modelId });
  return toModelOccupancy(houseOutcomes(facts as ReportFact[]));
}

/** One small mark per model slug for the catalog: n, and the rate where n ≥ 5. */
export async function listOccupancyMarks(): Promise<Map<string, PublicStat>> {
  const facts = await listCountedFacts();
  const slugOf = new Map(facts.map((f) => [f.modelId, f.slug]));
  const byModel = occupancyBy(houseOutcomes(facts as ReportFact[]), (o) => o.modelId);
  return new Map([...byModel].map(([modelId, stat]) => [slugOf.get(modelId)!, publicStat(stat)]));
}

/** How houses on sites with each placement rating fared, across every model. */
export async function getRatingOccupancy() {
  const outcomes = houseOutcomes((await listCountedFacts()) as ReportFact[]);
  const byRating = occupancyBy(outcomes, (o) => o.siteRating);
  return {
    minimumHouses: MIN_HOUSES_FOR_RATE,
    caveat: VOLUNTARY_CAVEAT,
    demo: outcomes.some((o) => o.demo && o.siteRating !== null),
    byRating: RATINGS.map((rating) => ({
      rating,
      label: RATING_LABELS[rating]!,
      ...publicStat(byRating.get(rating) ?? occupancyStat([])),
    })),
  };
}

// --- The staff picture: every breakdown, with k shown where n ≥ 5, and reports over time.

export async function getOccupancyPicture() {
  const facts = await listCountedFacts();
  const outcomes = houseOutcomes(facts as ReportFact[]);
  const names = new Map(facts.map((f) => [f.modelId, f.modelName]));
  const byModel = occupancyBy(outcomes, (o) => o.modelId);
  const byBand = occupancyBy(outcomes, (o) => o.bandId);
  const byMount = occupancyBy(outcomes, (o) => o.mount);
  const db = await getDb();
  const overTime = await db
    .select({
      season: roostReports.season,
      hemisphere: roostReports.hemisphere,
      answer: roostReports.answer,
      n: sql<number>`count(*)::int`,
    })
    .from(roostReports)
    .where(eq(roostReports.current, true))
    .groupBy(roostReports.season, roostReports.hemisphere, roostReports.answer)
    .orderBy(asc(roostReports.season));
  return {
    demo: outcomes.some((o) => o.demo),
    byModel: [...byModel]
      .map(([id, stat]) => ({ key: id, label: names.get(id) ?? "Unknown model", ...stat }))
      .sort((a, b) => b.n - a.n || a.label.localeCompare(b.label)),
    byBand: BAND_IDS.filter((id) => byBand.has(id)).map((id) => ({ key: id, label: CLIMATE_BANDS[id].label, ...byBand.get(id)! })),
    byMount: ["pole", "building", "tree"].filter((m) => byMount.has(m)).map((m) => ({ key: m, label: MOUNT_LABELS[m]!, ...byMount.get(m)! })),
    overTime: overTime.map((r) => ({ ...r, n: Number(r.n), label: seasonLabel({ season: r.season, hemisphere: r.hemisphere === "south" ? "south" : "north" }) })),
    firstOccupancy: firstOccupancy(outcomes),
  };
}

// --- Staff review.

export type ReviewRow = Awaited<ReturnType<typeof listReportsForReview>>[number];

export async function listReportsForReview({ limit = 100 }: { limit?: number } = {}) {
  const db = await getDb();
  return db
    .select({
      id: roostReports.id,
      modelName: houseModels.name,
      slug: houseModels.slug,
      unit: roostReports.unit,
      season: roostReports.season,
      hemisphere: roostReports.hemisphere,
      summer: roostReports.summer,
      answer: roostReports.answer,
      countBand: roostReports.countBand,
      note: roostReports.note,
      photoKeyBase: roostReports.photoKeyBase,
      photoWidths: roostReports.photoWidths,
      bandId: roostReports.bandId,
      mount: roostReports.mount,
      state: roostReports.state,
      reporter: roostReports.reporter,
      review: roostReports.review,
      reviewReason: roostReports.reviewReason,
      reviewerName: users.name,
      demo: roostReports.demo,
      reportedAt: roostReports.reportedAt,
    })
    .from(roostReports)
    .innerJoin(houseModels, eq(houseModels.id, roostReports.modelId))
    .leftJoin(users, eq(users.id, roostReports.reviewedById))
    .where(and(eq(roostReports.current, true), inArray(roostReports.review, ["new", "follow_up", "doubtful"])))
    .orderBy(
      sql`case ${roostReports.review} when 'new' then 0 when 'follow_up' then 1 else 2 end`,
      desc(roostReports.reportedAt),
    )
    .limit(limit);
}

export async function countReportsByModel() {
  const db = await getDb();
  const rows = await db
    .select({
      slug: houseModels.slug,
      name: houseModels.name,
      reports: sql<number>`count(*)::int`,
      houses: sql<number>`count(distinct ${roostReports.houseKey})::int`,
      occupied: sql<number>`count(*) filter (where ${roostReports.answer} in ('signs', 'bats_seen'))::int`,
      waiting: sql<number>`count(*) filter (where ${roostReports.review} = 'new')::int`,
      followUp: sql<number>`count(*) filter (where ${roostReports.review} = 'follow_up')::int`,
      doubtful: sql<number>`count(*) filter (where ${roostReports.review} = 'doubtful')::int`,
    })
    .from(roostReports)
    .innerJoin(houseModels, eq(houseModels.id, roostReports.modelId))
    .where(eq(roostReports.current, true))
    .groupBy(houseModels.slug, houseModels.name)
    .orderBy(asc(houseModels.name));
  return rows.map((r) => ({
    ...r,
    reports: Number(r.reports),
    houses: Number(r.houses),
    occupied: Number(r.occupied),
    waiting: Number(r.waiting),
    followUp: Number(r.followUp),
    doubtful: Number(r.doubtful),
  }));
}

// --- A buyer's own houses: what to ask on the order and account pages.

export type HouseQuestion = {
  orderId: string;
  orderLineId: string;
  unit: number;
  quantity: number;
  modelName: string;
  slug: string;
  season: number;
  seasonLabel: string;
  summer: number;
  siteMount: string | null;
  current: { answer: RoostAnswer; countBand: CountBand | null; note: string; hasPhoto: boolean; reportedAt: string } | null;
  history: { season: number; seasonLabel: string; answer: RoostAnswer; countBand: CountBand | null; reportedAt: string; current: boolean }[];
};

/** Each house of the given orders that has reached its buyer, with the season to answer for and what was said before. */
export async function listHouseQuestions({ orderIds, now = new Date() }: { orderIds: string[]; now?: Date }): Promise<HouseQuestion[]> {
  if (orderIds.length === 0) return [];
  const db = await getDb();
  const lines = (await loadHouseLines({ db, orderIds })).filter((l): l is HouseLine & { deliveredAt: Date } => l.deliveredAt !== null);
  if (lines.length === 0) return [];
  const reports = await db
    .select()
    .from(roostReports)
    .where(inArray(roostReports.orderLineId, lines.map((l) => l.orderLineId)))
    .orderBy(desc(roostReports.season), desc(roostReports.reportedAt));
  const questions: HouseQuestion[] = [];
  for (const line of lines) {
    const season = currentSeason({ date: now, hemisphere: line.hemisphere });
    const summer = summerNumber({ season, deliveredAt: line.deliveredAt, hemisphere: line.hemisphere });
    // Arrived after this season's maternity months: the first question comes next season.
    if (summer === null) continue;
    for (let unit = 1; unit <= line.quantity; unit += 1) {
      const key = houseKeyFor({ orderLineId: line.orderLineId, unit });
      const mine = reports.filter((r) => r.houseKey === key);
      const current = mine.find((r) => r.current && r.season === season) ?? null;
      questions.push({
        orderId: line.orderId,
        orderLineId: line.orderLineId,
        unit,
        quantity: line.quantity,
        modelName: line.modelName,
        slug: line.slug,
        season,
        seasonLabel: seasonLabel({ season, hemisphere: line.hemisphere }),
        summer,
        siteMount: line.mount,
        current: current
          ? {
              answer: current.answer,
              countBand: current.countBand,
              note: current.note,
              hasPhoto: current.photoKeyBase !== null,
              reportedAt: current.reportedAt.toISOString(),
            }
          : null,
        history: mine.map((r) => ({
          season: r.season,
          seasonLabel: seasonLabel({ season: r.season, hemisphere: line.hemisphere }),
          answer: r.answer,
          countBand: r.countBand,
          reportedAt: r.reportedAt.toISOString(),
          current: r.current,
        })),
      });
    }
  }
  return questions;
}

/** The house a verified e-mail token names, with its current answer for the season. */
export async function getLinkedHouse({ orderLineId, unit, season }: { orderLineId: string; unit: number; season: number }) {
  const db = await getDb();
  const [line] = await loadHouseLines({ db, orderLineIds: [orderLineId] });
  if (!line || unit > line.quantity) return null;
  const [current] = await db
    .select({ answer: roostReports.answer, countBand: roostReports.countBand })
    .from(roostReports)
    .where(and(eq(roostReports.houseKey, houseKeyFor({ orderLineId, unit })), eq(roostReports.season, season), eq(roostReports.current, true)));
  return { line, current: current ?? null, seasonLabel: seasonLabel({ season, hemisphere: line.hemisphere }) };
}

export async function getHouseLine({ orderLineId }: { orderLineId: string }): Promise<HouseLine | null> {
  const db = await getDb();
  const [line] = await loadHouseLines({ db, orderLineIds: [orderLineId] });
  return line ?? null;
}

// Everything a roost report needs to know about the houses of an order, read in ONE query so
// the rule for each field lives in one place:
// - delivered: the latest "delivered" or "picked up" event of an order that is in that state now;
// - the band: from the saved site that went with the order. When orders carry the band the
//   buyer saw (PRODUCT.md §2, "the band travels with the order"), read it here first and fall
//   back to the site's;
// - the mount and the site's rating: from the saved site's check;
// - the hemisphere: from the saved site's latitude, else the north (lib/roost-reports/season-rules.ts);
// - the state: from the shipping address (a state is as fine as public figures go, PRODUCT.md §8).

export type HouseLine = {
  orderId: string;
  orderNumber: number;
  orderStatus: string;
  email: string;
  buyerName: string;
  userId: string | null;
  orderLineId: string;
  modelId: string;
  modelName: string;
  slug: string;
  quantity: number;
  deliveredAt: Date | null;
  siteId: string | null;
  bandId: string | null;
  mount: string | null;
  siteRating: string | null;
  state: string | null;
  hemisphere: Hemisphere;
};

const ARRIVED = ["delivered", "picked_up"] as const;

export async function loadHouseLines({
  db,
  orderIds,
  orderLineIds,
  arrivedOnly = false,
}: {
  db: DbOrTx;
  orderIds?: string[];
  orderLineIds?: string[];
  arrivedOnly?: boolean;
}): Promise<HouseLine[]> {
  const where: SQL[] = [];
  if (orderIds) where.push(orderIds.length ? inArray(orders.id, orderIds) : sql`false`);
  if (orderLineIds) where.push(orderLineIds.length ? inArray(orderLines.id, orderLineIds) : sql`false`);
  if (arrivedOnly) where.push(inArray(orders.status, [...ARRIVED]));
  const deliveredAt = sql<Date | string | null>`(
    select max(${orderEvents.createdAt}) from ${orderEvents}
    where ${orderEvents.orderId} = ${orders.id} and ${orderEvents.toStatus} in ('delivered', 'picked_up')
  )`;
  const rows = await db
    .select({
      orderId: orders.id,
      orderNumber: orders.number,
      orderStatus: orders.status,
      email: orders.email,
      buyerName: orders.name,
      userId: orders.userId,
      orderLineId: orderLines.id,
      modelId: orderLines.modelId,
      modelName: houseModels.name,
      slug: orderLines.slug,
      quantity: orderLines.quantity,
      deliveredAt,
      siteId: orders.siteId,
      bandId: sites.bandId,
      mount: sql<string | null>`${sites.input}->>'mount'`,
      siteRating: sites.label,
      siteLat: sql<number | string | null>`(${sites.result}->'location'->>'lat')`,
      state: sql<string | null>`${orders.shipTo}->>'state'`,
    })
    .from(orderLines)
    .innerJoin(orders, eq(orders.id, orderLines.orderId))
    .innerJoin(houseModels, eq(houseModels.id, orderLines.modelId))
    .leftJoin(sites, eq(sites.id, orders.siteId))
    .where(where.length ? and(...where) : undefined)
    .orderBy(asc(orders.number), asc(orderLines.name));
  return rows.map(({ siteLat, deliveredAt: at, ...row }) => {
    const lat = siteLat === null ? null : Number(siteLat);
    const arrived = (ARRIVED as readonly string[]).includes(row.orderStatus) && at !== null;
    return {
      ...row,
      deliveredAt: arrived ? new Date(at) : null,
      hemisphere: hemisphereOf({ siteLat: Number.isFinite(lat) ? lat : null }),
    };
  });
}

/** Whether this address asked for no more roost-report questions (checked again just before sending). */
export async function hasOptedOutOfRoostMail({ db, email }: { db: DbOrTx; email: string }): Promise<boolean> {
  const [optedOut] = await db.select().from(roostAskOptOuts).where(eq(roostAskOptOuts.email, email.toLowerCase()));
  return Boolean(optedOut);
}

/** Whether an answer link (by its token's random id) has already recorded its answer. */
export async function isLinkUsed({ nonce }: { nonce: string }): Promise<boolean> {
  const db = await getDb();
  const [row] = await db.select({ nonce: roostReportLinkUses.nonce }).from(roostReportLinkUses).where(eq(roostReportLinkUses.nonce, nonce));
  return Boolean(row);
}

/** The private order page (path and access token) of the order a verified link is about. */
export async function getOrderPagePath({ orderId }: { orderId: string }): Promise<string | null> {
  const db = await getDb();
  const [row] = await db.select({ token: orders.accessToken }).from(orders).where(eq(orders.id, orderId));
  return row ? `/orders/${orderId}?t=${encodeURIComponent(row.token)}` : null;
}
