import type { IncomingMessage, Server, ServerResponse } from "node:http";

/** Plain HTTP plumbing shared by the local stand-ins (no framework on purpose: they must start in milliseconds). */

export class BodyTooLargeError extends Error {}

/** Reads the whole request body as UTF-8; the stand-ins never need streaming and a cap keeps a runaway client in check. */
export async function readBody(req: IncomingMessage, limitBytes = 5_000_000): Promise<string> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of req) {
    const buffer = typeof chunk === "string" ? Buffer.from(chunk) : (chunk as Buffer);
    size += buffer.length;
    if (size > limitBytes) throw new BodyTooLargeError(`Request body exceeds ${limitBytes} bytes`);
    chunks.push(buffer);
  }
  return Buffer.concat(chunks).toString("utf8");
}

export function sendJson({
  res,
  status,
  body,
  headers = {},
}: {
  res: ServerResponse;
  status: number;
  body: unknown;
  headers?: Record<string, string>;
}): void {
  const text = JSON.stringify(body, null, 2);
  res.writeHead(status, {
    "Content-Type": "application/json; charset=utf-8",
    "Content-Length": Buffer.byteLength(text),
    "Cache-Control": "no-store",
    ...headers,
  });
  res.end(text);
}

export function sendHtml({
  res,
  status,
  html,
}: {
  res: ServerResponse;
  status: number;
  html: string;
}) {
  res.writeHead(status, {
    "Content-Type": "text/html; charset=utf-8",
    "Content-Length": Buffer.byteLength(html),
    "Cache-Control": "no-store",
    // The inbox shows untrusted e-mail HTML: only inline styles, no scripts, frames only from srcdoc.
    "Content-Security-Policy":
      "default-src 'none'; style-src 'unsafe-inline'; img-src data: http: https:; frame-src 'self' about:; base-uri 'none'; form-action 'self'",
  });
  res.end(html);
}

/** Binds to the loopback interface only: these fakes accept any test key and must never be reachable from the network. */
export async function listenOnLoopback({ server, port }: { server: Server; port: number }) {
  await new Promise<void>((resolve, reject) => {
    const onError = (error: Error) => reject(error);
    server.once("error", onError);
    server.listen(port, "127.0.0.1", () => {
      server.off("error", onError);
      resolve();
    });
  });
  const address = server.address();
  if (address === null || typeof address === "string") throw new Error("Server has no TCP address");
  return `http://127.0.0.1:${address.port}`;
}

/** Closes the listener and drops idle keep-alive sockets so tests and Ctrl-C never hang. */
export async function closeServer(server: Server): Promise<void> {
  if (!server.listening) return;
  await new Promise<void>((resolve, reject) => {
    server.close((error) => (error ? reject(error) : resolve()));
    server.closeIdleConnections();
    // Connections still mid-request get a short grace period, then are cut.
    setTimeout(() => server.closeAllConnections(), 200).unref();
  });
}

/** One line per request when STAND_IN_LOG=1, nothing otherwise. */
export function createRequestLogger({ name, enabled }: { name: string; enabled: boolean }) {
  return (req: IncomingMessage, res: ServerResponse) => {
    if (!enabled) return;
    const startedAt = performance.now();
    res.once("finish", () => {
      const ms = Math.round(performance.now() - startedAt);
      process.stdout.write(`[${name}] ${req.method} ${req.url} ${res.statusCode} ${ms}ms\n`);
    });
  };
}

export function isLogEnabled(explicit: boolean | undefined): boolean {
  return explicit ?? process.env.STAND_IN_LOG === "1";
}
