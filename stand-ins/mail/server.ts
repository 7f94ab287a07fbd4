import { createServer, type IncomingMessage, type ServerResponse } from "node:http";
import {
  closeServer,
  createRequestLogger,
  isLogEnabled,
  listenOnLoopback,
  readBody,
  sendHtml,
  sendJson,
} from "../shared/http";
import { handleMailApi, mailError } from "./api-routes";
import { renderInboxPage, renderMessagePage, renderNotFoundPage } from "./inbox-pages";
import { createMessageStore, type StoredMessage } from "./message-store";

/**
 * Local stand-in for the mail API: the `resend` SDK, with RESEND_BASE_URL set to this server's
 * url, sends here. Pages: `GET /` (inbox), `GET /messages/:id`. Test controls (no API key):
 *   GET    /_stand-in/messages   every message, newest first
 *   DELETE /_stand-in/messages   empty the inbox (and the kept idempotency answers)
 *   POST   /_stand-in/down | up  make every API call answer 503, or stop doing so
 *   GET    /_stand-in/status     { down, messages }
 */

export interface MailStandInOptions {
  port: number;
  /** JSON file that keeps messages across restarts, e.g. var/mail-stand-in.json. */
  dataFile?: string;
  /** When set, only this key is accepted; otherwise any `re_…` key. */
  apiKey?: string;
  /** One log line per request; defaults to STAND_IN_LOG=1. */
  log?: boolean;
}

export interface MailStandIn {
  url: string;
  close(): Promise<void>;
  /** Newest first. */
  messages(): StoredMessage[];
  setDown(down: boolean): void;
}

export async function startMailStandIn(options: MailStandInOptions): Promise<MailStandIn> {
  const store = createMessageStore({ dataFile: options.dataFile });
  const logRequest = createRequestLogger({ name: "mail", enabled: isLogEnabled(options.log) });
  let down = false;

  function handleControl(res: ServerResponse, method: string, path: string) {
    if (path === "/_stand-in/messages" && method === "GET")
      return sendJson({ res, status: 200, body: { data: store.list() } });
    if (path === "/_stand-in/messages" && method === "DELETE") {
      store.clear();
      return sendJson({ res, status: 200, body: { cleared: true } });
    }
    if ((path === "/_stand-in/down" || path === "/_stand-in/up") && method === "POST") {
      down = path.endsWith("/down");
      return sendJson({ res, status: 200, body: { down } });
    }
    if (path === "/_stand-in/status" && method === "GET") {
      return sendJson({ res, status: 200, body: { down, messages: store.list().length } });
    }
    return sendJson({
      res,
      status: 404,
      body: { message: `Unknown stand-in control route: ${method} ${path}` },
    });
  }

  async function handle(req: IncomingMessage, res: ServerResponse) {
    const method = req.method ?? "GET";
    const path = new URL(req.url ?? "/", "http://127.0.0.1").pathname.replace(/(.)\/+$/, "$1");
    const body = await readBody(req);
    if (path.startsWith("/_stand-in/")) return handleControl(res, method, path);
    if (path === "/favicon.ico") return void res.writeHead(204).end();
    if (method === "GET" && path === "/")
      return sendHtml({
        res,
        status: 200,
        html: renderInboxPage({ messages: store.list(), down }),
      });
    const page = /^\/messages\/([^/]+)$/.exec(path);
    if (method === "GET" && page?.[1]) {
      const message = store.get(decodeURIComponent(page[1]));
      return message
        ? sendHtml({ res, status: 200, html: renderMessagePage({ message }) })
        : sendHtml({ res, status: 404, html: renderNotFoundPage() });
    }
    const answer = down
      ? mailError({
          status: 503,
          name: "application_error",
          message:
            "The local mail stand-in is switched down for testing (POST /_stand-in/up brings it back).",
        })
      : handleMailApi({ store, method, path, headers: req.headers, body, apiKey: options.apiKey });
    sendJson({ res, status: answer.status, body: answer.body });
  }

  const server = createServer((req, res) => {
    logRequest(req, res);
    handle(req, res).catch((error: unknown) => {
      const message = error instanceof Error ? error.message : String(error);
      if (res.headersSent) return void res.end();
      sendJson({
        res,
        status: 500,
        body: { statusCode: 500, name: "internal_server_error", message },
      });
    });
  });
  const url = await listenOnLoopback({ server, port: options.port });

  return {
    url,
    close: () => closeServer(server),
    messages: () => store.list(),
    setDown(value) {
      down = value;
    },
  };
}
