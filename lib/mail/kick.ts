import { nudge } from "@/lib/jobs/nudge";

/** The job that runs the outbox sender (lib/mail/delivery-job.ts), registered in lib/jobs/store-jobs.ts. */
export const MAIL_DELIVERY_JOB = "mail-delivery";

/**
 * Asks the outbox sender to deliver pending messages soon, without waiting for its next run.
 * Call it after the transaction that queued the messages commits. Before the job runner starts
 * (scripts, tests) this is a no-op: the sender's next scheduled run delivers them.
 */
export function kickMailSender(): void {
  nudge(MAIL_DELIVERY_JOB);
}
