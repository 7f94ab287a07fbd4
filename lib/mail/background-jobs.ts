import "server-only";
import { deliverPendingMail } from "./sender";
import { registerMailKick } from "./kick";
import { queueSeasonalReminders } from "./seasonal-job";
import { queueRoostReportMail } from "@/lib/roost-reports/season-job";

// The mail jobs of one server process: the outbox sender every few seconds (and at once when an
// event kicks it), and the seasonal reminders once a day. Started from instrumentation.ts.

export const SEND_INTERVAL_MS = 5_000;
const DAY_CHECK_INTERVAL_MS = 60_000;

const globalForJobs = globalThis as unknown as { __roostwrightMailJobs?: () => void };

export function startMailJobs(): () => void {
  if (globalForJobs.__roostwrightMailJobs) return globalForJobs.__roostwrightMailJobs;
  let sending = false;
  let again = false;
  const send = async () => {
    // One run at a time per process; a kick during a run asks for one more pass after it.
    if (sending) {
      again = true;
      return;
    }
    sending = true;
    try {
      do {
        again = false;
        await deliverPendingMail();
      } while (again);
    } catch (error) {
      console.error("mail: the outbox sender failed; it tries again shortly", error);
    } finally {
      sending = false;
    }
  };
  let lastDay = "";
  const daily = async () => {
    const today = new Date().toISOString().slice(0, 10);
    if (today === lastDay) return;
    try {
      const { queued } = await queueSeasonalReminders({ now: new Date() });
      const roost = await queueRoostReportMail({ now: new Date() });
      lastDay = today;
      if (queued + roost.asked + roost.advised > 0) void send();
    } catch (error) {
      console.error("mail: queueing seasonal reminders failed; it tries again in a minute", error);
    }
  };
  registerMailKick(() => void send());
  const timers = [
    setInterval(() => void send(), SEND_INTERVAL_MS),
    setInterval(() => void daily(), DAY_CHECK_INTERVAL_MS),
  ];
  for (const timer of timers) timer.unref();
  void send();
  void daily();
  const stop = () => {
    for (const timer of timers) clearInterval(timer);
    registerMailKick(() => {});
    globalForJobs.__roostwrightMailJobs = undefined;
  };
  globalForJobs.__roostwrightMailJobs = stop;
  return stop;
}
