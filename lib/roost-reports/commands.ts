import "server-only";
import { and, eq, inArray, ne } from "drizzle-orm";
import { getDb, type Tx } from "@/db/client";
import { outbox, roostAskOptOuts, roostReportLinkUses, roostReports } from "@/db/schema";
import { AppError } from "@/lib/http/errors";
import { enqueueEmail } from "@/lib/mail/commands/outbox";
import { deleteImages, putImages } from "@/lib/uploads/object-store";
import { prepareImage } from "@/lib/uploads/prepare-image";
import { houseKeyFor, usedLinkWords, type CountBand, type RoostAnswer } from "./answers";
import { loadHouseLines, type HouseLine } from "./queries";
import { newReportPhotoKeyBase } from "./photo-keys";
import type { ReviewInput } from "./report-input";
import { ADVICE_KIND, ASK_KIND, housesStillEmpty, housesToAsk, type CurrentReport } from "./season-job";
import { currentSeason, seasonLabel, seasonToAdvise, seasonToAsk, summerNumber } from "./season-rules";

export type Reporter =
  | { kind: "account"; userId: string }
  | { kind: "order_link"; tokenHash: string; userId: string | null }
  | { kind: "email_link"; tokenHash: string };

export type ReportOutcome = "recorded" | "changed" | "unchanged";

type Photo = { keyBase: string; widths: number[] };

/** The summer number a season is for this house, or a clear refusal. */
export function checkReportableSeason({ line, season, now }: { line: HouseLine; season: number; now: Date }): number {
  if (!line.deliveredAt)
    throw new AppError("conflict", "This house has not arrived yet: you can tell us about it once it is delivered or picked up.", {
      season: "The house has not arrived yet.",
    });
  const latest = currentSeason({ date: now, hemisphere: line.hemisphere });
  const summer = summerNumber({ season, deliveredAt: line.deliveredAt, hemisphere: line.hemisphere });
  if (season > latest || summer === null) {
    const message = `The ${seasonLabel({ season, hemisphere: line.hemisphere })} season is not one this house has had yet.`;
    throw new AppError("bad_request", message, { season: message });
  }
  return summer;
}

async function storePhoto(bytes: Uint8Array, fileName: string): Promise<Photo & { keys: string[] }> {
  // The same checks as the workshop's photos: sniffed type, size, structure (no polyglots), a
  // pixel limit, then a fresh WebP encode without the camera's metadata (GPS included).
  const image = await prepareImage({ bytes, fileName });
  const keyBase = newReportPhotoKeyBase();
  const objects = image.renders.map((r) => ({ key: `${keyBase}-${r.width}.webp`, body: r.body }));
  await putImages(objects);
  return { keyBase, widths: image.renders.map((r) => r.width), keys: objects.map((o) => o.key) };
}

function isUniqueViolation(error: unknown): boolean {
  const e = error as { code?: string; cause?: { code?: string } } | null;
  return e?.code === "23505" || e?.cause?.code === "23505";
}

/**
 * Records one answer about one house for one season. The same answer again changes nothing;
 * a different answer, count, note or photo becomes the current report and the old one stays as
 * history. An e-mail link's answer (`linkNonce`, its token's random id) is kept as used in the
 * same transaction: the same link again, even at the same instant, is refused and writes nothing.
 */
export async function recordHouseReport({
  line,
  unit,
  season,
  answer,
  countBand,
  note = "",
  mount,
  photo,
  reporter,
  linkNonce,
  now = new Date(),
}: {
  line: HouseLine;
  unit: number;
  season: number;
  answer: RoostAnswer;
  countBand?: CountBand;
  note?: string;
  mount?: string;
  photo?: { bytes: Uint8Array; fileName: string };
  reporter: Reporter;
  linkNonce?: string;
  now?: Date;
}): Promise<{ outcome: ReportOutcome; reportId: string }> {
  if (!Number.isInteger(unit) || unit < 1 || unit > line.quantity) {
    const message = `This order line has ${line.quantity} ${line.quantity === 1 ? "house" : "houses"}; choose one of them.`;
    throw new AppError("bad_request", message, { unit: message });
  }
  const summer = checkReportableSeason({ line, season, now });
  const stored = photo ? await storePhoto(photo.bytes, photo.fileName) : null;
  const houseKey = houseKeyFor({ orderLineId: line.orderLineId, unit });
  const currentOf = (tx: Tx) =>
    tx
      .select()
      .from(roostReports)
      .where(and(eq(roostReports.houseKey, houseKey), eq(roostReports.season, season), eq(roostReports.current, true)));
  const write = async (tx: Tx) => {
    if (linkNonce) {
      // First, so a second request with the same link waits here for the first to commit, then
      // finds the id taken and stops before touching the reports.
      const [use] = await tx
        .insert(roostReportLinkUses)
        .values({ nonce: linkNonce, houseKey, season, answer, usedAt: now })
        .onConflictDoNothing()
        .returning({ nonce: roostReportLinkUses.nonce });
      if (!use) {
        const [current] = await currentOf(tx);
        const message = usedLinkWords(current ?? null);
        throw new AppError("conflict", message, { token: message });
      }
    }
    const [existing] = await currentOf(tx);
    const same = existing?.answer === answer;
    const nextCount = answer === "bats_seen" ? (countBand ?? (same ? existing?.countBand : null) ?? null) : null;
    const nextNote = note || (same ? (existing?.note ?? "") : "");
    const nextMount = mount ?? existing?.mount ?? line.mount;
    if (existing && same && !stored && nextCount === existing.countBand && nextNote === existing.note && nextMount === existing.mount) {
      return { outcome: "unchanged" as const, reportId: existing.id };
    }
    if (existing) {
      await tx.update(roostReports).set({ current: false, replacedAt: now }).where(eq(roostReports.id, existing.id));
    }
    const keepPhoto = same && existing?.photoKeyBase ? { keyBase: existing.photoKeyBase, widths: existing.photoWidths ?? [] } : null;
    const usePhoto = stored ?? keepPhoto;
    const [row] = await tx
      .insert(roostReports)
      .values({
        houseKey,
        orderLineId: line.orderLineId,
        unit,
        modelId: line.modelId,
        season,
        hemisphere: line.hemisphere,
        summer,
        answer,
        countBand: nextCount,
        note: nextNote,
        photoKeyBase: usePhoto?.keyBase ?? null,
        photoWidths: usePhoto?.widths ?? null,
        siteId: line.siteId,
        bandId: line.bandId,
        mount: nextMount,
        state: line.state,
        siteRating: line.siteRating,
        reporter: reporter.kind,
        reporterUserId: reporter.kind === "email_link" ? null : reporter.userId,
        reporterTokenHash: reporter.kind === "account" ? null : reporter.tokenHash,
        reportedAt: now,
      })
      .returning({ id: roostReports.id });
    return { outcome: existing ? ("changed" as const) : ("recorded" as const), reportId: row!.id };
  };
  const db = await getDb();
  try {
    try {
      return await db.transaction(write);
    } catch (error) {
      // Two answers for the same house at the same instant: the later one goes on top.
      if (!isUniqueViolation(error)) throw error;
      return await db.transaction(write);
    }
  } catch (error) {
    if (stored) await deleteImages(stored.keys).catch((e: unknown) => console.error("report photo cleanup:", e));
    throw error;
  }
}

/** A staff decision on a report: doubtful ones leave the figures, with the reason kept beside them. */
export async function reviewRoostReport({ input, actorId, now = new Date() }: { input: ReviewInput; actorId: string; now?: Date }) {
  const db = await getDb();
  const [row] = await db
    .update(roostReports)
    .set({ review: input.decision, reviewReason: input.reason, reviewedById: actorId, reviewedAt: now })
    .where(eq(roostReports.id, input.reportId))
    .returning({ id: roostReports.id, review: roostReports.review });
  if (!row) throw new AppError("not_found", "That report does not exist.");
  return row;
}

/** No more end-of-season questions to this address; repeating it is harmless. */
export async function optOutOfRoostQuestions({ email }: { email: string }): Promise<void> {
  const db = await getDb();
  await db.insert(roostAskOptOuts).values({ email: email.toLowerCase() }).onConflictDoNothing();
}

// The end-of-season questions and the two-summers advice. Run once a day on the job queue
// (lib/jobs/store-jobs.ts). Idempotent however often it runs and in however many app instances:
// one message per order per season, by the outbox dedupe keys `roost-ask:<season>:<orderId>`
// and `roost-advice:<season>:<orderId>`.

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
