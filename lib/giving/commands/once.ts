import "server-only";
import { eq } from "drizzle-orm";
import type { Tx } from "@/db/client";
import { getDb } from "@/db/client";
import { giftDedications, type OrderRow } from "@/db/schema";
import type { SessionUser } from "@/lib/auth/session";
import { startCheckout, type CheckoutStarted } from "@/lib/checkout/commands/orders";
import { enqueueEmail } from "@/lib/mail/commands/outbox";
import { feeToCover } from "../fee";
import type { GiveOnceRequest } from "../once-schemas";
import { getGivingSettings } from "../queries";

/**
 * A one-time gift with its extras: the card fee the donor chose to cover (the center's rate,
 * computed here and added to the gift) and a tribute. The order itself is the ordinary checkout
 * (a gift with no goods); the extras are kept beside it.
 */
export async function startGiftOnce(input: GiveOnceRequest, user: SessionUser | null): Promise<CheckoutStarted & { feeCoveredCents: number }> {
  const settings = await getGivingSettings();
  const feeCoveredCents = input.coverFee ? feeToCover({ giftCents: input.amountCents, basisPoints: settings.feeBasisPoints, fixedCents: settings.feeFixedCents }) : 0;
  const started = await startCheckout({ items: [], method: "pickup", giftCents: input.amountCents + feeCoveredCents, contact: input.contact }, user);
  if (feeCoveredCents > 0 || input.tribute) {
    const db = await getDb();
    await db.insert(giftDedications).values({
      orderId: started.orderId,
      tributeKind: input.tribute?.kind ?? null,
      tributeName: input.tribute?.name ?? null,
      noticeName: input.tribute?.notice?.name ?? null,
      noticeEmail: input.tribute?.notice?.email ?? null,
      noticeShowsAmount: input.tribute?.notice?.showAmount ?? false,
      feeCoveredCents,
    });
  }
  return { ...started, feeCoveredCents };
}

/** Called where the gift is recorded (the payment webhook's transaction): the tribute notice, once. */
export async function queueTributeNotice(tx: Tx, order: OrderRow): Promise<void> {
  const [dedication] = await tx.select().from(giftDedications).where(eq(giftDedications.orderId, order.id));
  if (!dedication?.tributeKind || !dedication.tributeName || !dedication.noticeEmail) return;
  const words = dedication.tributeKind === "memory" ? "in memory of" : "in honour of";
  await enqueueEmail(tx, {
    dedupeKey: `tribute-notice:${order.id}`,
    kind: "tribute-notice",
    to: dedication.noticeEmail,
    subject: `A gift ${words} ${dedication.tributeName}`,
    payload: { orderId: order.id },
  });
}
