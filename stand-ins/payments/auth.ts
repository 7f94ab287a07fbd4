import type { IncomingMessage } from "node:http";
import type { ApiRequest } from "./engine";
import { authenticationFailed } from "./errors";
import type { Params } from "./params";

/**
 * API keys: Bearer auth from servers (`sk_test_…`), or the `key` form field the browser library
 * sends with a publishable key (`pk_test_…`), which keeps its requests free of CORS preflights.
 * Live keys are refused outright: a fake must never be mistaken for the real service.
 * Source: "Authentication" and "API keys", Stripe API reference (2024).
 */

export interface ExpectedKeys {
  secretKey?: string;
  publishableKey?: string;
}

function redact(key: string): string {
  return `${key.slice(0, 8)}${"*".repeat(Math.max(0, key.length - 12))}${key.slice(-4)}`;
}

function readPresentedKey(req: IncomingMessage, params: Params): string | undefined {
  const header = req.headers.authorization;
  if (header?.startsWith("Bearer ")) return header.slice("Bearer ".length).trim();
  if (header?.startsWith("Basic ")) {
    // curl -u sk_test_…: sends "key:" in Basic auth.
    return Buffer.from(header.slice("Basic ".length), "base64").toString("utf8").split(":")[0];
  }
  return typeof params.key === "string" ? params.key : undefined;
}

export function authenticate({
  req,
  params,
  expected,
}: {
  req: IncomingMessage;
  params: Params;
  expected: ExpectedKeys;
}): ApiRequest["auth"] {
  const key = readPresentedKey(req, params);
  if (!key) {
    throw authenticationFailed(
      "You did not provide an API key. You need to provide your API key in the Authorization header, using Bearer auth (e.g. 'Authorization: Bearer YOUR_SECRET_KEY').",
    );
  }
  if (/^(sk|rk|pk)_live_/.test(key)) {
    throw authenticationFailed(
      "The local payments stand-in accepts test-mode keys only; a live key was provided.",
    );
  }
  const kind = key.startsWith("pk_") ? "publishable" : "secret";
  const wanted = kind === "publishable" ? expected.publishableKey : expected.secretKey;
  const validShape =
    kind === "publishable" ? key.startsWith("pk_test_") : /^(sk|rk)_test_/.test(key);
  if ((wanted !== undefined && key !== wanted) || (wanted === undefined && !validShape)) {
    throw authenticationFailed(`Invalid API Key provided: ${redact(key)}`);
  }
  return { kind, key };
}
