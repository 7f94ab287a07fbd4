import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import { decodeForm } from "../shared/form-decode";
import {
  closeServer,
  createRequestLogger,
  isLogEnabled,
  listenOnLoopback,
  readBody,
  sendJson,
} from "../shared/http";
import { createPrefixedId } from "../shared/ids";
import { matchApiRoute } from "./api-routes";
import { authenticate, type ExpectedKeys } from "./auth";
import { BROWSER_SCRIPT_PATH, sendBrowserScript } from "./browser-script";
import { handleControlRequest, type ControlContext } from "./control-routes";
import {
  createPaymentsEngine,
  type ApiRequest,
  type ApiResponse,
  type PaymentsEngine,
} from "./engine";
import { StripeApiError, authenticationFailed, idempotencyConflict } from "./errors";
import { createIdempotencyStore, fingerprintRequest, type IdempotencyStore } from "./idempotency";
import type { StripeEvent } from "./objects";
import { createWebhookDispatcher, type DeliveryAttempt } from "./webhook-dispatcher";

/**
 * Local stand-in for the payments API: the `stripe` SDK (server) and `browser/stripe.js` (the
 * browser library, served here at `/stripe.js`) talk to it instead of the hosted service. Routes:
 * see api-routes.ts; test controls: see control-routes.ts.
 */

// The version the `stripe` SDK 23.1 pins; events carry the caller's Stripe-Version when it sends one.
const DEFAULT_API_VERSION = "2026-10-28.endive";

const CORS_HEADERS = {
  "Access-Control-Allow-Origin": "*",
  "Access-Control-Allow-Methods": "GET, POST, DELETE, OPTIONS",
  "Access-Control-Allow-Headers":
    "Authorization, Content-Type, Idempotency-Key, Stripe-Version, Stripe-Account",
  "Access-Control-Expose-Headers": "Request-Id, Idempotent-Replayed, Idempotency-Key",
  "Access-Control-Max-Age": "600",
};

export interface PaymentsStandInOptions extends ExpectedKeys {
  port: number;
  webhookUrl?: string;
  webhookSecret: string;
  /** Delays between webhook attempts; the default is 1 s doubling to 64 s (8 tries). */
  webhookRetryDelaysMs?: readonly number[];
  webhookTimeoutMs?: number;
  /** One log line per request; defaults to STAND_IN_LOG=1. */
  log?: boolean;
}

export interface PaymentsStandIn {
  url: string;
  close(): Promise<void>;
  events(): StripeEvent[];
  deliveries(): DeliveryAttempt[];
  setWebhooksPaused(paused: boolean): void;
  /** Resolves when no webhook delivery is in flight or waiting for a retry. */
  webhooksIdle(): Promise<void>;
}

function runApiRequest({
  engine,
  idempotency,
  request,
}: {
  engine: PaymentsEngine;
  idempotency: IdempotencyStore;
  request: ApiRequest;
}): ApiResponse & { replayed: boolean } {
  const found = matchApiRoute({ method: request.method, path: request.path });
  if (!found) {
    throw new StripeApiError({
      status: 404,
      body: {
        type: "invalid_request_error",
        message: `Unrecognized request URL (${request.method}: ${request.path}).`,
      },
    });
  }
  if (request.auth.kind === "publishable" && !found.route.publishable) {
    throw authenticationFailed(
      "This API call cannot be made with a publishable API key. Please use a secret API key.",
    );
  }
  const run = () => {
    try {
      return found.route.handler({ engine, request, id: found.id });
    } catch (error) {
      if (error instanceof StripeApiError)
        return { status: error.status, body: { error: error.body } };
      throw error;
    }
  };
  const key = request.method === "POST" ? request.idempotencyKey : null;
  if (!key) return { ...run(), replayed: false };
  const fingerprint = fingerprintRequest({
    method: request.method,
    path: request.path,
    params: request.params,
  });
  const seen = idempotency.lookup({ apiKey: request.auth.key, key, fingerprint });
  if (seen.kind === "replay") return { ...seen.answer, replayed: true };
  if (seen.kind === "conflict") throw idempotencyConflict(key);
  const answer = run();
  idempotency.remember({ apiKey: request.auth.key, key, fingerprint, answer });
  return { ...answer, replayed: false };
}

export async function startPaymentsStandIn(
  options: PaymentsStandInOptions,
): Promise<PaymentsStandIn> {
  const dispatcher = createWebhookDispatcher({
    url: options.webhookUrl,
    secret: options.webhookSecret,
    retryDelaysMs: options.webhookRetryDelaysMs,
    timeoutMs: options.webhookTimeoutMs,
  });
  const engine = createPaymentsEngine({
    onEvent: (event) => dispatcher.enqueue(event),
    hasWebhookEndpoint: Boolean(options.webhookUrl),
  });
  const idempotency = createIdempotencyStore();
  const control: ControlContext = {
    engine,
    dispatcher,
    idempotency,
    webhookUrl: options.webhookUrl,
  };
  const logRequest = createRequestLogger({ name: "payments", enabled: isLogEnabled(options.log) });

  async function handle(req: IncomingMessage, res: ServerResponse) {
    const url = new URL(req.url ?? "/", "http://127.0.0.1");
    const method = req.method ?? "GET";
    const requestId = createPrefixedId({ prefix: "req", length: 14 });
    const headers: Record<string, string> = { ...CORS_HEADERS, "Request-Id": requestId };
    if (method === "OPTIONS") {
      res.writeHead(204, headers).end();
      return;
    }
    if ((method === "GET" || method === "HEAD") && url.pathname === BROWSER_SCRIPT_PATH) {
      await sendBrowserScript(res, headers);
      return;
    }
    const body = await readBody(req);
    if (url.pathname.startsWith("/_stand-in")) {
      const answer = await handleControlRequest({ context: control, method, url, body });
      sendJson({ res, status: answer.status, body: answer.body, headers });
      return;
    }
    const apiVersion = String(req.headers["stripe-version"] ?? DEFAULT_API_VERSION);
    const idempotencyKey =
      typeof req.headers["idempotency-key"] === "string" ? req.headers["idempotency-key"] : null;
    headers["Stripe-Version"] = apiVersion;
    if (idempotencyKey) headers["Idempotency-Key"] = idempotencyKey;
    try {
      const params = decodeForm(method === "POST" ? body : url.search.slice(1));
      const auth = authenticate({ req, params, expected: options });
      const request: ApiRequest = {
        method,
        path: url.pathname,
        params,
        auth,
        requestId,
        idempotencyKey,
        apiVersion,
      };
      const answer = runApiRequest({ engine, idempotency, request });
      if (answer.replayed) headers["Idempotent-Replayed"] = "true";
      sendJson({ res, status: answer.status, body: answer.body, headers });
    } catch (error) {
      if (!(error instanceof StripeApiError)) throw error;
      sendJson({ res, status: error.status, body: { error: error.body }, headers });
    }
  }

  const server = createServer((req, res) => {
    logRequest(req, res);
    handle(req, res).catch((error: unknown) => {
      const message = error instanceof Error ? error.message : String(error);
      if (res.headersSent) return void res.end();
      sendJson({
        res,
        status: 500,
        body: { error: { type: "api_error", message } },
        headers: CORS_HEADERS,
      });
    });
  });
  const url = await listenOnLoopback({ server, port: options.port });

  return {
    url,
    async close() {
      dispatcher.close();
      await closeServer(server);
    },
    events: () => [...engine.state.events],
    deliveries: () => dispatcher.attempts(),
    setWebhooksPaused: (paused) => dispatcher.setPaused(paused),
    webhooksIdle: () => dispatcher.idle(),
  };
}
