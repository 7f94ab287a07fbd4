import "server-only";
import { timingSafeEqual } from "node:crypto";
import type { SessionUser } from "@/lib/auth/session";
import { getOrderForViewer } from "@/lib/checkout/queries/order-access";
import { AppError } from "@/lib/http/errors";
import { recordHouseReport, type Reporter } from "./commands";
import { getHouseLine, listHouseQuestions } from "./queries";
import type { HouseReportInput } from "./report-input";
import { tokenFingerprint } from "./report-tokens";

function sameToken(a: string, b: string): boolean {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
}

/**
 * A report from the order page or the account page. Only the buyer answers: signed in as the
 * order's account, or holding the order's private link (a guest). Staff who can open any order
 * cannot answer for a buyer.
 */
export async function reportFromOrderPage({
  orderId,
  accessToken,
  user,
  input,
  photo,
}: {
  orderId: string;
  accessToken: string | null;
  user: SessionUser | null;
  input: HouseReportInput;
  photo?: { bytes: Uint8Array; fileName: string };
}) {
  const order = await getOrderForViewer({ orderId, token: accessToken, user });
  let reporter: Reporter;
  if (user && order.userId === user.id) reporter = { kind: "account", userId: user.id };
  else if (accessToken && sameToken(accessToken, order.accessToken))
    reporter = { kind: "order_link", tokenHash: tokenFingerprint(accessToken), userId: user?.id ?? null };
  else throw new AppError("forbidden", "Only the buyer can report on this order's houses.");
  const line = await getHouseLine({ orderLineId: input.orderLineId });
  if (!line || line.orderId !== order.id) {
    throw new AppError("bad_request", "That house is not part of this order.", { orderLineId: "That house is not part of this order." });
  }
  return recordHouseReport({
    line,
    unit: input.unit,
    season: input.season,
    answer: input.answer,
    countBand: input.countBand,
    note: input.note,
    mount: input.mount,
    photo,
    reporter,
  });
}

/** The questions for an order page, only for its buyer (account or private link), else none. */
export async function listReportQuestionsForViewer({
  order,
  token,
  user,
}: {
  order: { id: string; userId: string | null; accessToken: string };
  token: string | null | undefined;
  user: SessionUser | null;
}) {
  const isBuyer = (user && order.userId === user.id) || (token ? sameToken(token, order.accessToken) : false);
  return isBuyer ? listHouseQuestions({ orderIds: [order.id] }) : [];
}
