import "server-only";
import { createElement } from "react";
import type { DbOrTx } from "@/db/client";
import { formatOrderNumber } from "@/lib/checkout/order-number";
import { yearEndStatement } from "@/lib/checkout/receipts";
import { env } from "@/lib/config/env";
import { cautionsFor, MOVE_IN_PATIENCE } from "@/lib/safety/cautions";
import { LowStockEmail } from "@/emails/low-stock";
import { PasswordResetEmail } from "@/emails/password-reset";
import { SeasonalReminderEmail } from "@/emails/seasonal-reminder";
import { YearEndStatementEmail } from "@/emails/year-end-statement";
import type { Composition } from "./composition";
import { getCenterTimeZone } from "@/lib/giving/queries";
import { formatMailDate } from "./format";
import { findModelForAlert, findReminderSubscription, listGiftsForStatement, loadUser } from "./queries/account-for-mail";
import { loadOrgFooter } from "./queries/order-for-mail";
import {
  lowStockPayloadSchema,
  parsePayload,
  passwordResetPayloadSchema,
  PermanentMailError,
  seasonalPayloadSchema,
  yearEndPayloadSchema,
} from "./payloads";
import { openText } from "./sealed";
import { reminderWindowsFor } from "./seasons";
import { unsubscribeLinks } from "./unsubscribe-links";
import { RESET_TOKEN_TTL_MS } from "./tokens";
import { getUpkeepSeason } from "./upkeep-calendar";

async function passwordReset(db: DbOrTx, payload: unknown): Promise<Composition> {
  const parsed = parsePayload({
    schema: passwordResetPayloadSchema,
    payload,
    kind: "password-reset",
  });
  const token = openText({ sealed: parsed.sealedToken, secret: env().NEXTAUTH_SECRET });
  if (!token)
    throw new PermanentMailError(
      "The reset link cannot be read back (the app secret changed); the person should ask for a new one.",
    );
  const user = await loadUser(db, parsed.userId);
  return {
    element: createElement(PasswordResetEmail, {
      org: await loadOrgFooter({ db }),
      name: user.name,
      resetUrl: `${env().APP_URL}/reset-password?token=${encodeURIComponent(token)}`,
      validMinutes: RESET_TOKEN_TTL_MS / 60_000,
    }),
    scrubbedPayload: {
      userId: parsed.userId,
      sealedToken: null,
      note: "token removed after sending",
    },
  };
}

async function yearEnd(db: DbOrTx, payload: unknown): Promise<Composition> {
  const { userId, year, issuedOn } = parsePayload({
    schema: yearEndPayloadSchema,
    payload,
    kind: "year-end-statement",
  });
  const user = await loadUser(db, userId);
  const rows = await listGiftsForStatement({ db, userId });
  const timeZone = await getCenterTimeZone(db);
  const statement = yearEndStatement({ gifts: rows, year, timeZone });
  const numbers = new Map(rows.map((row) => [row.orderId, formatOrderNumber(row.number)]));
  return {
    element: createElement(YearEndStatementEmail, {
      org: await loadOrgFooter({ db }),
      donorName: user.name,
      year,
      issuedOn: formatMailDate(new Date(issuedOn), timeZone),
      gifts: statement.gifts.map((gift) => ({
        date: formatMailDate(gift.date, timeZone),
        orderNumber: numbers.get(gift.orderId) ?? "",
        amountCents: gift.amountCents,
      })),
      totalCents: statement.totalCents,
      statements: statement.statements,
      timeZone,
    }),
  };
}

async function seasonal(db: DbOrTx, payload: unknown): Promise<Composition> {
  const { userId, reminderId, hemisphere } = parsePayload({
    schema: seasonalPayloadSchema,
    payload,
    kind: "seasonal-reminder",
  });
  const user = await loadUser(db, userId);
  const preferences = await findReminderSubscription({ db, userId });
  // Turned off between queueing and sending: the wish to stop wins.
  if (!preferences)
    throw new PermanentMailError("Not sent: the recipient turned seasonal reminders off.");
  const window = reminderWindowsFor(hemisphere).find((w) => w.id === reminderId);
  if (!window) throw new PermanentMailError(`No reminder ${reminderId}.`);
  const links = unsubscribeLinks({ token: preferences.unsubscribeToken });
  return {
    element: createElement(SeasonalReminderEmail, {
      org: await loadOrgFooter({ db }),
      name: user.name,
      season: getUpkeepSeason({ id: window.season, hemisphere }),
      cautions: cautionsFor({ hemisphere }),
      patience: reminderId === "spring-return" ? MOVE_IN_PATIENCE : null,
      preferencesUrl: `${env().APP_URL}/account/preferences`,
      unsubscribeUrl: links.pageUrl,
    }),
    headers: links.headers,
  };
}

async function lowStock(db: DbOrTx, payload: unknown): Promise<Composition> {
  const { modelId, userId, stockAfter, threshold } = parsePayload({
    schema: lowStockPayloadSchema,
    payload,
    kind: "low-stock",
  });
  const user = await loadUser(db, userId);
  const model = await findModelForAlert({ db, modelId });
  if (!model) throw new PermanentMailError(`Model ${modelId} no longer exists.`);
  return {
    element: createElement(LowStockEmail, {
      org: await loadOrgFooter({ db }),
      staffName: user.name,
      modelName: model.name,
      stock: stockAfter,
      threshold,
      modelUrl: `${env().APP_URL}/staff/models/${encodeURIComponent(model.slug)}`,
    }),
  };
}

/** Messages about an account: password reset, year-end statement, seasonal reminders, staff alerts. */
export async function composeAccountMessage({
  db,
  kind,
  payload,
}: {
  db: DbOrTx;
  kind: string;
  payload: unknown;
}): Promise<Composition> {
  switch (kind) {
    case "password-reset":
      return passwordReset(db, payload);
    case "year-end-statement":
      return yearEnd(db, payload);
    case "seasonal-reminder":
      return seasonal(db, payload);
    case "low-stock":
      return lowStock(db, payload);
    default:
      throw new PermanentMailError(`No template for kind ${kind}.`);
  }
}
