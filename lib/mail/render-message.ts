import "server-only";
import { render } from "@react-email/components";
import type { DbOrTx } from "@/db/client";
import type { OutboxRow } from "@/db/schema";
import { composeAccountMessage } from "./compose-account";
import { composeInstallGuide } from "./compose-guide";
import { composeOrderMessage } from "./compose-order";
import type { Composition } from "./composition";
import { PermanentMailError } from "./payloads";
import { PLAIN_TEXT_OPTIONS } from "./plain-text";
import { composeRoostReportMessage, ROOST_MAIL_KINDS } from "@/lib/roost-reports/compose-mail";

const ORDER_KINDS = new Set([
  "order-confirmation",
  "gift-receipt",
  "shipped",
  "delivered",
  "ready-for-pickup",
  "refund",
  "payment-refunded",
]);
const ACCOUNT_KINDS = new Set([
  "password-reset",
  "year-end-statement",
  "seasonal-reminder",
  "low-stock",
]);

/** Every kind of message the sender can render; anything else waits as "failed" for a developer. */
export const MAIL_KINDS = [...ORDER_KINDS, "install-guide", ...ACCOUNT_KINDS, ...ROOST_MAIL_KINDS] as const;

export type RenderedMessage = Omit<Composition, "element"> & { html: string; text: string };

function compose({
  db,
  row,
}: {
  db: DbOrTx;
  row: Pick<OutboxRow, "kind" | "payload">;
}): Promise<Composition> {
  if (row.kind === "install-guide") return composeInstallGuide({ db, payload: row.payload });
  if (ORDER_KINDS.has(row.kind))
    return composeOrderMessage({ db, kind: row.kind, payload: row.payload });
  if (ACCOUNT_KINDS.has(row.kind))
    return composeAccountMessage({ db, kind: row.kind, payload: row.payload });
  if ((ROOST_MAIL_KINDS as readonly string[]).includes(row.kind))
    return composeRoostReportMessage({ db, kind: row.kind, payload: row.payload });
  return Promise.reject(new PermanentMailError(`No template for kind "${row.kind}".`));
}

/**
 * Renders one outbox message from what the database holds now: HTML with the store's look and a
 * plain-text version for mail programs that show no HTML (react-email's html-to-text pass).
 */
export async function renderOutboxMessage({
  db,
  row,
}: {
  db: DbOrTx;
  row: Pick<OutboxRow, "kind" | "payload">;
}): Promise<RenderedMessage> {
  const { element, ...envelope } = await compose({ db, row });
  const [html, text] = await Promise.all([
    render(element),
    render(element, { plainText: true, htmlToTextOptions: PLAIN_TEXT_OPTIONS }),
  ]);
  return { ...envelope, html, text };
}
