import { readFile } from "node:fs/promises";
import type { ServerResponse } from "node:http";

/**
 * The browser library the payments stand-in serves, as the hosted service serves its own script:
 * `GET {STRIPE_API_BASE}/stripe.js`. The store's layout loads it before the app's bundle when the
 * local stand-ins are on; it then calls this same server's API.
 */
export const BROWSER_SCRIPT_PATH = "/stripe.js";

const SCRIPT_FILE = new URL("./browser/stripe.js", import.meta.url);

let cached: Promise<Buffer> | null = null;

export async function sendBrowserScript(res: ServerResponse, headers: Record<string, string>) {
  cached ??= readFile(SCRIPT_FILE);
  const script = await cached;
  res.writeHead(200, {
    ...headers,
    "Content-Type": "text/javascript; charset=utf-8",
    "Content-Length": script.length,
    "Cache-Control": "no-cache",
  });
  res.end(script);
}
