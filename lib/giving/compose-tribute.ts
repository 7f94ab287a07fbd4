import "server-only";
import { createElement } from "react";
import type { DbOrTx } from "@/db/client";
import type { Composition } from "@/lib/mail/composition";
import { parsePayload, PermanentMailError, tributeNoticePayloadSchema } from "@/lib/mail/payloads";
import { loadOrderForMail, loadOrgFooter } from "@/lib/mail/queries/order-for-mail";
import { TributeNoticeEmail } from "@/emails/tribute-notice";
import { findDedicationForOrder } from "./queries";

export async function composeTributeNotice({ db, payload }: { db: DbOrTx; payload: unknown }): Promise<Composition> {
  const { orderId } = parsePayload({ schema: tributeNoticePayloadSchema, payload, kind: "tribute-notice" });
  const [data, dedication] = await Promise.all([loadOrderForMail({ db, orderId }), findDedicationForOrder(orderId, db)]);
  if (!dedication?.tributeKind || !dedication.tributeName || !dedication.noticeEmail) throw new PermanentMailError("The gift has no tribute notice.");
  return {
    element: createElement(TributeNoticeEmail, {
      org: await loadOrgFooter({ db }),
      noticeName: dedication.noticeName || "friend",
      donorName: data.order.name,
      kind: dedication.tributeKind === "memory" ? "memory" : "honor",
      tributeName: dedication.tributeName,
      amountCents: dedication.noticeShowsAmount ? data.order.giftCents : null,
    }),
  };
}
