import "server-only";
import { createElement } from "react";
import type { DbOrTx } from "@/db/client";
import { env } from "@/lib/config/env";
import type { Composition } from "@/lib/mail/composition";
import { monthlyChangedPayloadSchema, monthlyFailedPayloadSchema, parsePayload, PermanentMailError } from "@/lib/mail/payloads";
import { loadOrgFooter } from "@/lib/mail/queries/order-for-mail";
import { MonthlyGiftChangedEmail } from "@/emails/monthly-gift-changed";
import { MonthlyGiftFailedEmail } from "@/emails/monthly-gift-failed";
import { managePath } from "./manage-link";
import { findMonthlyGift } from "./queries";
import { composeTributeNotice } from "./compose-tribute";

/** The giving family of messages: a failed monthly renewal, a change or stop, a tribute notice. */
export async function composeGivingMessage({ db, kind, payload }: { db: DbOrTx; kind: string; payload: unknown }): Promise<Composition> {
  if (kind === "tribute-notice") return composeTributeNotice({ db, payload });
  if (kind === "monthly-gift-failed") {
    const parsed = parsePayload({ schema: monthlyFailedPayloadSchema, payload, kind });
    const gift = await findMonthlyGift(parsed.monthlyGiftId, db);
    if (!gift) throw new PermanentMailError("The monthly gift is gone.");
    if (gift.status === "stopped") throw new PermanentMailError("Not sent: the monthly gift was stopped since.");
    return {
      element: createElement(MonthlyGiftFailedEmail, { org: await loadOrgFooter({ db }), donorName: gift.name, amountCents: parsed.amountCents, manageUrl: `${env().APP_URL}${parsed.managePath}` }),
    };
  }
  if (kind === "monthly-gift-changed") {
    const parsed = parsePayload({ schema: monthlyChangedPayloadSchema, payload, kind });
    const gift = await findMonthlyGift(parsed.monthlyGiftId, db);
    if (!gift) throw new PermanentMailError("The monthly gift is gone.");
    return {
      element: createElement(MonthlyGiftChangedEmail, {
        org: await loadOrgFooter({ db }),
        donorName: gift.name,
        change: parsed.change,
        amountCents: gift.amountCents,
        manageUrl: `${env().APP_URL}${managePath({ monthlyGiftId: gift.id, secret: env().NEXTAUTH_SECRET })}`,
      }),
    };
  }
  throw new PermanentMailError(`No giving template for kind "${kind}".`);
}
