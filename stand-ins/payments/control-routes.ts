import { advanceClock } from "./billing";
import type { PaymentsEngine } from "./engine";
import type { IdempotencyStore } from "./idempotency";
import type { WebhookDispatcher } from "./webhook-dispatcher";

/**
 * Test-only endpoints under `/_stand-in/` (no API key; the server listens on loopback only):
 *   GET  /_stand-in/events[?type=…]            events, oldest first, each with its delivery attempts
 *   GET  /_stand-in/events/:id                 one event with its attempts
 *   POST /_stand-in/events/:id/resend          deliver again; JSON body or query: times (1–50), parallel
 *   GET  /_stand-in/deliveries                 every delivery attempt
 *   GET  /_stand-in/webhooks                   { url, paused, held }
 *   POST /_stand-in/webhooks/pause | resume    hold deliveries / send what was held
 *   POST /_stand-in/reset                      forget every object, event, attempt and idempotency key
 *   GET  /_stand-in/test-clocks                every test clock (to find a customer's without an API key)
 *   POST /_stand-in/test-clocks/:id/advance    JSON body { days } or { frozen_time }: as the API's advance
 */

export interface ControlContext {
  engine: PaymentsEngine;
  dispatcher: WebhookDispatcher;
  idempotency: IdempotencyStore;
  webhookUrl: string | undefined;
}

export interface ControlAnswer {
  status: number;
  body: unknown;
}

function readResendOptions(query: URLSearchParams, body: string) {
  let fromBody: { times?: unknown; parallel?: unknown } = {};
  try {
    fromBody = body.trim() ? (JSON.parse(body) as typeof fromBody) : {};
  } catch {
    fromBody = {};
  }
  const times = Number(fromBody.times ?? query.get("times") ?? 1);
  const parallel = fromBody.parallel === true || query.get("parallel") === "true";
  return { times: Number.isInteger(times) ? Math.min(Math.max(times, 1), 50) : 1, parallel };
}

function withDeliveries(context: ControlContext, eventId: string) {
  const event = context.engine.state.events.find((candidate) => candidate.id === eventId);
  if (!event) return null;
  return {
    event,
    deliveries: context.dispatcher.attempts().filter((attempt) => attempt.eventId === eventId),
  };
}

function webhookStatus(context: ControlContext) {
  return {
    url: context.webhookUrl ?? null,
    paused: context.dispatcher.isPaused(),
    held: context.dispatcher.heldCount(),
  };
}

export async function handleControlRequest({
  context,
  method,
  url,
  body,
}: {
  context: ControlContext;
  method: string;
  url: URL;
  body: string;
}): Promise<ControlAnswer> {
  const path = url.pathname.replace(/\/+$/, "");
  const { engine, dispatcher } = context;
  if (method === "GET" && path === "/_stand-in/events") {
    const type = url.searchParams.get("type");
    const events = engine.state.events.filter((event) => !type || event.type === type);
    return {
      status: 200,
      body: { data: events.map((event) => withDeliveries(context, event.id)) },
    };
  }
  const eventMatch = /^\/_stand-in\/events\/([A-Za-z0-9_]+)(\/resend)?$/.exec(path);
  if (eventMatch?.[1]) {
    const found = withDeliveries(context, eventMatch[1]);
    if (!found)
      return { status: 404, body: { error: { message: `No such event: '${eventMatch[1]}'` } } };
    if (method === "GET" && !eventMatch[2]) return { status: 200, body: found };
    if (method === "POST" && eventMatch[2]) {
      const options = readResendOptions(url.searchParams, body);
      const attempts = await dispatcher.resend({ event: found.event, ...options });
      return { status: 200, body: { data: attempts } };
    }
  }
  if (method === "GET" && path === "/_stand-in/test-clocks") {
    return { status: 200, body: { data: [...engine.state.testClocks.values()] } };
  }
  const clockMatch = /^\/_stand-in\/test-clocks\/([A-Za-z0-9_]+)\/advance$/.exec(path);
  if (method === "POST" && clockMatch?.[1]) {
    const clock = engine.state.testClocks.get(clockMatch[1]);
    if (!clock) return { status: 404, body: { error: { message: `No such test clock: '${clockMatch[1]}'` } } };
    let asked: { days?: unknown; frozen_time?: unknown } = {};
    try {
      asked = body.trim() ? (JSON.parse(body) as typeof asked) : {};
    } catch {
      asked = {};
    }
    const to = typeof asked.frozen_time === "number" ? asked.frozen_time : clock.frozen_time + Math.round(Number(asked.days ?? 0) * 86_400);
    if (!Number.isInteger(to) || to <= clock.frozen_time) return { status: 400, body: { error: { message: "The test clock can only move forward." } } };
    advanceClock({ engine, clock, to, request: { method, path, params: {}, auth: { kind: "secret", key: "" }, requestId: "req_control", idempotencyKey: null, apiVersion: "2026-10-28.endive" } });
    return { status: 200, body: clock };
  }
  if (method === "GET" && path === "/_stand-in/deliveries")
    return { status: 200, body: { data: dispatcher.attempts() } };
  if (method === "GET" && path === "/_stand-in/webhooks")
    return { status: 200, body: webhookStatus(context) };
  if (
    method === "POST" &&
    (path === "/_stand-in/webhooks/pause" || path === "/_stand-in/webhooks/resume")
  ) {
    dispatcher.setPaused(path.endsWith("/pause"));
    return { status: 200, body: webhookStatus(context) };
  }
  if (method === "POST" && path === "/_stand-in/reset") {
    const { state } = engine;
    [
      state.intents,
      state.charges,
      state.refunds,
      state.customers,
      state.paymentMethods,
      state.cardNumbers,
      state.products,
      state.prices,
      state.subscriptions,
      state.invoices,
      state.invoiceOfIntent,
      state.testClocks,
    ].forEach((map) => map.clear());
    state.events.length = 0;
    dispatcher.clearAttempts();
    context.idempotency.clear();
    return { status: 200, body: { reset: true } };
  }
  return {
    status: 404,
    body: { error: { message: `Unknown stand-in control route: ${method} ${path}` } },
  };
}
