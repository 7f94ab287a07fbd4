import type { FormValue } from "../shared/form-decode";

/**
 * Idempotent requests: the first answer to a POST with an `Idempotency-Key` is kept for 24 hours
 * and replayed for the same key and the same parameters; the same key with other parameters is an
 * `idempotency_error`. Answers of requests that never started (bad parameters, bad key) are not
 * kept, so they can be retried with a fix. Keys are scoped to the API key that sent them.
 * Source: "Idempotent requests", Stripe API reference (2024).
 */

const RETENTION_MS = 24 * 60 * 60 * 1000;

export interface StoredAnswer {
  status: number;
  body: unknown;
}

interface Entry {
  fingerprint: string;
  answer: StoredAnswer;
  storedAt: number;
}

export type IdempotencyLookup =
  { kind: "new" } | { kind: "replay"; answer: StoredAnswer } | { kind: "conflict" };

/** Parameters compared as values: key order in the body does not make a request different. */
export function fingerprintRequest({
  method,
  path,
  params,
}: {
  method: string;
  path: string;
  params: FormValue;
}) {
  return `${method} ${path} ${JSON.stringify(sortKeys(params))}`;
}

function sortKeys(value: FormValue): unknown {
  if (typeof value === "string") return value;
  if (Array.isArray(value)) return value.map(sortKeys);
  return Object.fromEntries(
    Object.keys(value)
      .sort()
      .map((key) => [key, sortKeys(value[key] ?? "")]),
  );
}

export function createIdempotencyStore({ now = () => Date.now() }: { now?: () => number } = {}) {
  const entries = new Map<string, Entry>();
  const scoped = (apiKey: string, key: string) => `${apiKey}\u0000${key}`;

  return {
    lookup({
      apiKey,
      key,
      fingerprint,
    }: {
      apiKey: string;
      key: string;
      fingerprint: string;
    }): IdempotencyLookup {
      const entry = entries.get(scoped(apiKey, key));
      if (!entry || now() - entry.storedAt > RETENTION_MS) return { kind: "new" };
      return entry.fingerprint === fingerprint
        ? { kind: "replay", answer: entry.answer }
        : { kind: "conflict" };
    },
    /** Keeps answers of requests that ran: successes and card declines (402), per the rule above. */
    remember({
      apiKey,
      key,
      fingerprint,
      answer,
    }: {
      apiKey: string;
      key: string;
      fingerprint: string;
      answer: StoredAnswer;
    }) {
      if (answer.status !== 200 && answer.status !== 402) return;
      entries.set(scoped(apiKey, key), { fingerprint, answer, storedAt: now() });
    },
    clear() {
      entries.clear();
    },
  };
}

export type IdempotencyStore = ReturnType<typeof createIdempotencyStore>;
