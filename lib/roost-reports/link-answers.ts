import "server-only";
import { env } from "@/lib/config/env";
import { AppError } from "@/lib/http/errors";
import { recordHouseReport } from "./commands";
import { ANSWER_WORDS, ROOST_ANSWERS, usedLinkWords } from "./answers";
import { getHouseLine, getLinkedHouse, getOrderPagePath, isLinkUsed } from "./queries";
import type { LinkAnswerInput } from "./report-input";
import { signAnswerToken, tokenFingerprint, TOKEN_REFUSAL_WORDS, verifyAnswerToken, verifyOptOutToken } from "./report-tokens";
import { optOutOfRoostQuestions } from "./commands";

const answerPagePath = (token: string) => `/roost-reports/answer?token=${encodeURIComponent(token)}`;

/** Applies the answer an e-mail link names; anyone holding the link may, no sign-in needed. */
export async function answerFromLink({ input, now = new Date() }: { input: LinkAnswerInput; now?: Date }) {
  const secret = env().NEXTAUTH_SECRET;
  const verified = verifyAnswerToken({ secret, token: input.token, now });
  if (!verified.ok) throw new AppError("bad_request", TOKEN_REFUSAL_WORDS[verified.reason], { token: TOKEN_REFUSAL_WORDS[verified.reason] });
  const { claims } = verified;
  const line = await getHouseLine({ orderLineId: claims.orderLineId });
  if (!line) throw new AppError("not_found", "The house this link is about is no longer on an order.");
  const result = await recordHouseReport({
    line,
    unit: claims.unit,
    season: claims.season,
    answer: claims.answer,
    countBand: claims.answer === "bats_seen" ? input.countBand : undefined,
    note: input.note,
    reporter: { kind: "email_link", tokenHash: tokenFingerprint(input.token) },
    linkNonce: claims.nonce,
    now,
  });
  // The link is spent: the page offers freshly signed links for the other answers (each works
  // once, like the e-mail's) and the private order page, so the answer stays changeable.
  const others = ROOST_ANSWERS.filter((a) => a !== claims.answer).map((answer) => ({
    answer,
    label: ANSWER_WORDS[answer].label,
    href: answerPagePath(
      signAnswerToken({ secret, claims: { orderLineId: claims.orderLineId, unit: claims.unit, season: claims.season, answer }, now }),
    ),
  }));
  const orderPath = await getOrderPagePath({ orderId: line.orderId });
  return { ...result, answer: claims.answer, others, orderPath };
}

/** The one-click way out of the end-of-season questions. */
export async function stopFromLink({ token, now = new Date() }: { token: string; now?: Date }) {
  const verified = verifyOptOutToken({ secret: env().NEXTAUTH_SECRET, token, now });
  if (!verified.ok) {
    const message =
      verified.reason === "expired"
        ? "This link is too old to use. Reply to any of our e-mails and we will stop the questions."
        : "This link was not made by our store for stopping these questions, so nothing was changed.";
    throw new AppError("bad_request", message, { token: message });
  }
  await optOutOfRoostQuestions({ email: verified.claims.email });
  return { email: verified.claims.email };
}

/** What an answer link would record, shown before the buyer confirms (GET changes nothing). */
export async function previewLinkAnswer({ token, now = new Date() }: { token: string; now?: Date }) {
  const verified = verifyAnswerToken({ secret: env().NEXTAUTH_SECRET, token, now });
  if (!verified.ok) return { ok: false as const, message: TOKEN_REFUSAL_WORDS[verified.reason] };
  const house = await getLinkedHouse(verified.claims);
  if (!house) return { ok: false as const, message: "The house this link is about is no longer on an order." };
  if (await isLinkUsed({ nonce: verified.claims.nonce })) return { ok: false as const, used: true as const, message: usedLinkWords(house.current) };
  const { line } = house;
  return {
    ok: true as const,
    claims: verified.claims,
    title: line.quantity > 1 ? `${line.modelName}, house ${verified.claims.unit} of ${line.quantity}` : line.modelName,
    seasonLabel: house.seasonLabel,
    hemisphere: line.hemisphere,
    current: house.current,
  };
}

/** Whether an opt-out link is ours and still good, without using it. */
export function checkStopLink({ token, now = new Date() }: { token: string; now?: Date }): boolean {
  return verifyOptOutToken({ secret: env().NEXTAUTH_SECRET, token, now }).ok;
}
