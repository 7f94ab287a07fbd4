import "server-only";
import { render } from "@react-email/components";
import type { DbOrTx } from "@/db/client";
import type { OutboxRow } from "@/db/schema";
import { composeAccountMessage } from "./compose-account";
import { composeInstallGuide } from "./compose-guide";
import { composeOrderMessage } from "./compose-order";
import type { Composition } from "./composition";
import { isMessageKind, MESSAGE_KINDS, PermanentMailError } from "./payloads";
import { PLAIN_TEXT_OPTIONS } from "./plain-text";
import { composeRoostReportMessage } from "@/lib/roost-reports/compose-mail";
import { composeGivingMessage } from "@/lib/giving/compose-mail";

export type RenderedMessage = Omit<Composition, "element"> & { html: string; text: string };

function compose({
  db,
  row,
}: {
  db: DbOrTx;
  row: Pick<OutboxRow, "kind" | "payload">;
}): Promise<Composition> {
  // A kind not in MESSAGE_KINDS (a row written before a kind was retired) waits as "failed".
  if (!isMessageKind(row.kind)) return Promise.reject(new PermanentMailError(`No template for kind "${row.kind}".`));
  switch (MESSAGE_KINDS[row.kind].family) {
    case "guide":
      return composeInstallGuide({ db, payload: row.payload });
    case "order":
      return composeOrderMessage({ db, kind: row.kind, payload: row.payload });
    case "account":
      return composeAccountMessage({ db, kind: row.kind, payload: row.payload });
    case "roost":
      return composeRoostReportMessage({ db, kind: row.kind, payload: row.payload });
    case "giving":
      return composeGivingMessage({ db, kind: row.kind, payload: row.payload });
  }
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
