import "server-only";
import { expireStaleReservations } from "@/lib/checkout/commands/orders";
import { retryRequestedRefunds } from "@/lib/checkout/commands/refunds";
import { STORE_TIME_ZONE } from "@/lib/fulfillment/store-time";
import { runMailDelivery } from "@/lib/mail/delivery-job";
import { kickMailSender, MAIL_DELIVERY_JOB } from "@/lib/mail/kick";
import { queueSeasonalReminders } from "@/lib/mail/commands/seasonal-reminders";
import { queueRoostReportMail } from "@/lib/roost-reports/commands";
import { queueJanuaryStatements } from "@/lib/giving/commands/statements";
import { registerJob } from "./registry";

// Every background job of the store, in one list. To add one: write its handler in its domain
// (a pass over rows the domain owns, safe to run twice), then register it here with a schedule
// and a retry policy. DEVELOPERS.md, "Background jobs", says more. Retry figures are common
// practice, no source.

export const RESERVATION_SWEEP_JOB = "reservations-expire";
export const SEASONAL_REMINDERS_JOB = "mail-seasonal-reminders";
export const REFUND_RETRY_JOB = "refunds-retry";
export const ROOST_REPORT_MAIL_JOB = "roost-report-questions";
export const JANUARY_STATEMENTS_JOB = "giving-january-statements";

// Unpaid reservations older than 30 minutes give their stock back; every minute, as before.
registerJob(
  RESERVATION_SWEEP_JOB,
  async ({ now }) => {
    await expireStaleReservations(now);
  },
  {
    schedule: { cron: "* * * * *" },
    retry: { limit: 2, delaySeconds: 10, backoff: false },
    timeoutSeconds: 5 * 60,
  },
);

// Refunds decided but not confirmed by the payment service (it was down, or the process died
// between the commit and the call): called again under their idempotency keys, every minute.
registerJob(
  REFUND_RETRY_JOB,
  async () => {
    await retryRequestedRefunds();
  },
  {
    schedule: { cron: "* * * * *" },
    retry: { limit: 2, delaySeconds: 10, backoff: false },
    timeoutSeconds: 5 * 60,
  },
);

// The outbox sender: when nudged (a message was queued), when the next retry falls due, and
// every minute as a backstop for messages queued by another instance or a lost nudge.
registerJob(
  MAIL_DELIVERY_JOB,
  async ({ now }) => {
    await runMailDelivery({ now });
  },
  {
    schedule: { cron: "* * * * *" },
    retry: { limit: 3, delaySeconds: 5, backoff: true, maxDelaySeconds: 60 },
    runOnStart: true,
    timeoutSeconds: 5 * 60,
  },
);

// Seasonal upkeep reminders: once a day at 8:00 store time, caught up after a day the store was
// down, and once at start (the dedupe key makes a second run in the same window a no-op).
registerJob(
  SEASONAL_REMINDERS_JOB,
  async ({ now }) => {
    const { queued } = await queueSeasonalReminders({ now });
    if (queued > 0) kickMailSender();
  },
  {
    schedule: { cron: "0 8 * * *", tz: STORE_TIME_ZONE, catchUp: true },
    retry: { limit: 6, delaySeconds: 60, backoff: true, maxDelaySeconds: 60 * 60 },
    runOnStart: true,
  },
);

// End-of-season roost-report questions and the second-summer advice: once a day at 9:00 store
// time; one message per order per season (dedupe keys), so a second run is a no-op.
registerJob(
  ROOST_REPORT_MAIL_JOB,
  async ({ now }) => {
    const { asked, advised } = await queueRoostReportMail({ now });
    if (asked + advised > 0) kickMailSender();
  },
  {
    schedule: { cron: "0 9 * * *", tz: STORE_TIME_ZONE, catchUp: true },
    retry: { limit: 6, delaySeconds: 60, backoff: true, maxDelaySeconds: 60 * 60 },
    runOnStart: true,
  },
);

// Year-end statements: every hour, and once at start; the handler acts only in the first days of
// January in the center's time zone (a setting, so not the schedule's zone), and the dedupe key
// (donor, year) makes every run after the first in that window a no-op, on any instance.
registerJob(
  JANUARY_STATEMENTS_JOB,
  async ({ now }) => {
    const { queued } = await queueJanuaryStatements({ now });
    if (queued > 0) kickMailSender();
  },
  {
    schedule: { cron: "15 * * * *", tz: "UTC", catchUp: true },
    retry: { limit: 6, delaySeconds: 60, backoff: true, maxDelaySeconds: 60 * 60 },
    runOnStart: true,
  },
);
