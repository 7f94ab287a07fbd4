import "server-only";
import { createElement } from "react";
import type { DbOrTx } from "@/db/client";
import { env } from "@/lib/config/env";
import type { Composition } from "@/lib/mail/composition";
import { loadOrderForMail } from "@/lib/mail/queries/order-for-mail";
import { parsePayload, PermanentMailError } from "@/lib/mail/payloads";
import { buildUnsubscribeHeaders } from "@/lib/mail/unsubscribe-headers";
import { RoostReportAdviceEmail } from "@/emails/roost-report-advice";
import { RoostReportAskEmail } from "@/emails/roost-report-ask";
import { ANSWER_WORDS, ROOST_ANSWERS } from "./answers";
import { cautionsFor, emptyHouseAdvice } from "./cautions";
import { roostAdvicePayloadSchema, roostAskPayloadSchema } from "./mail-payloads";
import { hasOptedOutOfRoostMail, loadHouseLines } from "./queries";
import { signAnswerToken, signOptOutToken } from "./report-tokens";
import { seasonLabel } from "./season-rules";
import { ADVICE_KIND, ASK_KIND } from "./season-job";

export const ROOST_MAIL_KINDS = [ASK_KIND, ADVICE_KIND] as const;

function houseTitle({ name, quantity, unit }: { name: string; quantity: number; unit: number }): string {
  return quantity > 1 ? `${name}, house ${unit} of ${quantity}` : name;
}

/** The one-click way out: a page with a button (for people) and the RFC 8058 POST target (for mail programs). */
function stopLinks({ orderId, email, now }: { orderId: string; email: string; now: Date }) {
  const token = signOptOutToken({ secret: env().NEXTAUTH_SECRET, claims: { orderId, email }, now });
  const query = `token=${encodeURIComponent(token)}`;
  return {
    pageUrl: `${env().APP_URL}/roost-reports/stop?${query}`,
    headers: buildUnsubscribeHeaders({ url: `${env().APP_URL}/api/roost-reports/stop?${query}` }),
  };
}

async function load(db: DbOrTx, kind: string, payload: unknown) {
  const schema = kind === ASK_KIND ? roostAskPayloadSchema : roostAdvicePayloadSchema;
  const parsed = parsePayload({ schema, payload, kind });
  const data = await loadOrderForMail({ db, orderId: parsed.orderId });
  // Asked to stop between queueing and sending: the wish to stop wins.
  if (await hasOptedOutOfRoostMail({ db, email: data.order.email })) throw new PermanentMailError("Not sent: the recipient asked for no more roost-report questions.");
  const lines = await loadHouseLines({ db, orderIds: [parsed.orderId] });
  const houses = parsed.houses.flatMap((h) => {
    const line = lines.find((l) => l.orderLineId === h.orderLineId);
    return line && h.unit <= line.quantity ? [{ ...h, line }] : [];
  });
  if (houses.length === 0) throw new PermanentMailError("None of the houses in this message are on the order any more.");
  const hemisphere = houses[0]!.line.hemisphere;
  return { parsed, data, houses, hemisphere };
}

export async function composeRoostReportMessage({
  db,
  kind,
  payload,
  now = new Date(),
}: {
  db: DbOrTx;
  kind: string;
  payload: unknown;
  now?: Date;
}): Promise<Composition> {
  if (kind !== ASK_KIND && kind !== ADVICE_KIND) throw new PermanentMailError(`No roost-report template for kind ${kind}.`);
  const { parsed, data, houses, hemisphere } = await load(db, kind, payload);
  const stop = stopLinks({ orderId: data.order.id, email: data.order.email, now });
  const secret = env().NEXTAUTH_SECRET;
  const common = { org: data.org, name: data.order.name, orderUrl: data.orderUrl, stopUrl: stop.pageUrl, cautions: cautionsFor({ hemisphere }) };
  if (kind === ASK_KIND) {
    return {
      element: createElement(RoostReportAskEmail, {
        ...common,
        seasonLabel: seasonLabel({ season: parsed.season, hemisphere }),
        houses: houses.map((h) => ({
          title: houseTitle({ name: h.line.modelName, quantity: h.line.quantity, unit: h.unit }),
          links: ROOST_ANSWERS.map((answer) => ({
            label: ANSWER_WORDS[answer].label,
            href: `${env().APP_URL}/roost-reports/answer?token=${encodeURIComponent(
              signAnswerToken({ secret, claims: { orderLineId: h.orderLineId, unit: h.unit, season: parsed.season, answer }, now }),
            )}`,
          })),
        })),
      }),
      headers: stop.headers,
      replyTo: data.org.email,
    };
  }
  return {
    element: createElement(RoostReportAdviceEmail, {
      ...common,
      houseTitles: houses.map((h) => houseTitle({ name: h.line.modelName, quantity: h.line.quantity, unit: h.unit })),
      advice: emptyHouseAdvice({ hemisphere }),
      plannerUrl: `${env().APP_URL}/placement`,
    }),
    headers: stop.headers,
    replyTo: data.org.email,
  };
}
