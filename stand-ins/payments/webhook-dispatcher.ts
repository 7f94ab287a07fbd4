import { nowInUnixSeconds } from "../shared/ids";
import type { StripeEvent } from "./objects";
import { signWebhookPayload } from "./webhook-signature";

/**
 * Delivers events to the app's webhook endpoint the way the payments service does: a POST with the
 * raw JSON body and a fresh `Stripe-Signature` per attempt; any non-2xx answer, timeout or refused
 * connection is retried with growing delays. The real service retries for up to three days; the
 * default here (1 s, 2 s, 4 s … 64 s, 8 tries) keeps the same shape at a scale a developer can watch.
 * Source: "Receive events in your webhook endpoint", Stripe documentation (2024); the delays are
 * common practice, no source.
 */

export const DEFAULT_RETRY_DELAYS_MS: readonly number[] = [
  1_000, 2_000, 4_000, 8_000, 16_000, 32_000, 64_000,
];

export interface DeliveryAttempt {
  eventId: string;
  eventType: string;
  attempt: number;
  trigger: "automatic" | "resend";
  startedAt: string;
  status: number | null;
  error: string | null;
  durationMs: number;
  succeeded: boolean;
}

export function createWebhookDispatcher({
  url,
  secret,
  retryDelaysMs = DEFAULT_RETRY_DELAYS_MS,
  timeoutMs = 10_000,
}: {
  url: string | undefined;
  secret: string;
  retryDelaysMs?: readonly number[];
  timeoutMs?: number;
}) {
  const attempts: DeliveryAttempt[] = [];
  const timers = new Set<NodeJS.Timeout>();
  const controllers = new Set<AbortController>();
  const held: Array<() => void> = [];
  let idleWaiters: Array<() => void> = [];
  let busy = 0;
  let paused = false;
  let closed = false;

  const settle = () => {
    busy = Math.max(0, busy - 1);
    if (busy > 0) return;
    const waiters = idleWaiters;
    idleWaiters = [];
    waiters.forEach((resolve) => resolve());
  };

  async function post(event: StripeEvent, attempt: number, trigger: DeliveryAttempt["trigger"]) {
    const payload = JSON.stringify(event, null, 2);
    const controller = new AbortController();
    controllers.add(controller);
    const timeout = setTimeout(
      () => controller.abort(new Error(`timed out after ${timeoutMs} ms`)),
      timeoutMs,
    );
    const startedAt = new Date();
    const record: DeliveryAttempt = {
      eventId: event.id,
      eventType: event.type,
      attempt,
      trigger,
      startedAt: startedAt.toISOString(),
      status: null,
      error: null,
      durationMs: 0,
      succeeded: false,
    };
    try {
      const response = await fetch(url ?? "", {
        method: "POST",
        body: payload,
        signal: controller.signal,
        headers: {
          "Content-Type": "application/json; charset=utf-8",
          "User-Agent": "roostwright-payments-stand-in/1.0",
          "Stripe-Signature": signWebhookPayload({
            payload,
            secret,
            timestamp: nowInUnixSeconds(),
          }),
        },
      });
      await response.arrayBuffer().catch(() => undefined);
      record.status = response.status;
      record.succeeded = response.status >= 200 && response.status < 300;
    } catch (error) {
      const cause =
        error instanceof Error && error.cause instanceof Error ? `: ${error.cause.message}` : "";
      record.error = error instanceof Error ? `${error.message}${cause}` : String(error);
    } finally {
      clearTimeout(timeout);
      controllers.delete(controller);
    }
    record.durationMs = Date.now() - startedAt.getTime();
    attempts.push(record);
    return record;
  }

  function runAutomatic(event: StripeEvent, index: number) {
    if (closed) return settle();
    if (paused) {
      // Held work is not "busy": idle() must still resolve while deliveries are paused.
      held.push(() => {
        busy += 1;
        runAutomatic(event, index);
      });
      return settle();
    }
    void post(event, index + 1, "automatic").then((record) => {
      const delay = retryDelaysMs[index];
      if (record.succeeded || closed || delay === undefined) return settle();
      const timer = setTimeout(() => {
        timers.delete(timer);
        runAutomatic(event, index + 1);
      }, delay);
      timers.add(timer);
    });
  }

  return {
    enqueue(event: StripeEvent) {
      if (!url || closed) return;
      busy += 1;
      runAutomatic(event, 0);
    },
    /** Sends an event again `times` times (one attempt each), one after another or all at once. */
    async resend({
      event,
      times,
      parallel,
    }: {
      event: StripeEvent;
      times: number;
      parallel: boolean;
    }) {
      if (!url) return [];
      const sends = Array.from({ length: times }, (_, i) => () => post(event, i + 1, "resend"));
      if (parallel) return Promise.all(sends.map((send) => send()));
      const results: DeliveryAttempt[] = [];
      for (const send of sends) results.push(await send());
      return results;
    },
    setPaused(value: boolean) {
      paused = value;
      if (!paused) held.splice(0).forEach((resume) => resume());
    },
    isPaused: () => paused,
    heldCount: () => held.length,
    attempts: () => [...attempts],
    clearAttempts() {
      attempts.length = 0;
    },
    /** Resolves once no delivery is in flight or waiting for a retry (held, paused ones excepted). */
    idle(): Promise<void> {
      if (busy === 0) return Promise.resolve();
      return new Promise((resolve) => idleWaiters.push(resolve));
    },
    close() {
      closed = true;
      timers.forEach((timer) => clearTimeout(timer));
      timers.clear();
      controllers.forEach((controller) => controller.abort(new Error("stand-in closing")));
      held.length = 0;
      busy = 0;
      idleWaiters.splice(0).forEach((resolve) => resolve());
    },
  };
}

export type WebhookDispatcher = ReturnType<typeof createWebhookDispatcher>;
