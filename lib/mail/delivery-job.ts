import "server-only";
import { nudge } from "@/lib/jobs/nudge";
import { MAIL_DELIVERY_JOB } from "./kick";
import { deliverPendingMail, type DeliveryReport } from "./commands/sender";
import { findNextMailAttempt } from "./queries/next-mail-attempt";

// One run of the outbox sender, as a job: deliver what is due, in batches, then ask the queue for
// the next run at the moment the earliest waiting message falls due (a retry after its backoff,
// or a claim whose sender died). The outbox rows keep their own attempts, backoff and lease
// (lib/mail/backoff.ts, commands/sender.ts); the queue only decides when the sender runs.

const BATCH = 25;
/** Enough for a busy morning in one run; the follow-up run takes the rest. Common practice, no source. */
const MAX_BATCHES = 20;

export async function runMailDelivery({ now }: { now: Date }): Promise<DeliveryReport> {
  const total: DeliveryReport = { sent: 0, retrying: 0, failed: 0 };
  for (let batch = 0; batch < MAX_BATCHES; batch++) {
    const report = await deliverPendingMail({ now, limit: BATCH });
    total.sent += report.sent;
    total.retrying += report.retrying;
    total.failed += report.failed;
    if (report.sent + report.retrying + report.failed < BATCH) break;
  }
  const next = await findNextMailAttempt();
  if (next) nudge(MAIL_DELIVERY_JOB, next > now ? { at: next } : {});
  return total;
}
