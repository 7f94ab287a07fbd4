import type { IncomingHttpHeaders } from "node:http";
import { checkEmail } from "./email-schema";
import { toStoredMessage, type MessageStore, type StoredMessage } from "./message-store";

/**
 * The mail API as the `resend` SDK v6 calls it: `POST /emails`, `POST /emails/batch`,
 * `GET /emails/:id`, `GET /emails`. Errors are `{ statusCode, name, message }`, which the SDK hands
 * back as `error` without throwing. Source: "Introduction" (errors), "Send Email", "Send Batch Emails"
 * and "Idempotency keys" in the Resend API reference (2025); `fetchRequest` in the SDK 6.38 (2026).
 */

export interface MailAnswer {
  status: number;
  body: unknown;
}

const BATCH_LIMIT = 100;

export function mailError({
  status,
  name,
  message,
}: {
  status: number;
  name: string;
  message: string;
}): MailAnswer {
  return { status, body: { statusCode: status, name, message } };
}

function checkApiKey(
  headers: IncomingHttpHeaders,
  expectedKey: string | undefined,
): MailAnswer | null {
  const header = headers.authorization;
  if (!header?.startsWith("Bearer ") || header.length <= "Bearer ".length) {
    return mailError({
      status: 401,
      name: "missing_api_key",
      message:
        "Missing API key in the authorization header. Include the following header 'Authorization: Bearer YOUR_API_KEY' in the request.",
    });
  }
  const key = header.slice("Bearer ".length).trim();
  const valid = expectedKey === undefined ? key.startsWith("re_") : key === expectedKey;
  return valid
    ? null
    : mailError({ status: 403, name: "invalid_api_key", message: "API key is invalid" });
}

function parseJson(body: string): { value: unknown } | { answer: MailAnswer } {
  try {
    return { value: JSON.parse(body) as unknown };
  } catch {
    return {
      answer: mailError({
        status: 422,
        name: "validation_error",
        message: "The request body is not valid JSON.",
      }),
    };
  }
}

/** Public view of a stored message (what `GET /emails/:id` answers). */
function present(message: StoredMessage) {
  const { idempotency_key: _key, attachments: _attachments, ...rest } = message;
  return rest;
}

function acceptEmails({
  value,
  batch,
  permissive,
  idempotencyKey,
}: {
  value: unknown;
  batch: boolean;
  permissive: boolean;
  idempotencyKey: string | null;
}): { answer: MailAnswer; messages: StoredMessage[] } {
  if (!batch) {
    const checked = checkEmail(value);
    if ("problem" in checked)
      return { answer: mailError({ status: 422, ...checked.problem }), messages: [] };
    const message = toStoredMessage({ email: checked.email, idempotencyKey });
    return { answer: { status: 200, body: { id: message.id } }, messages: [message] };
  }
  if (!Array.isArray(value) || value.length === 0 || value.length > BATCH_LIMIT) {
    const message = `A batch must be a JSON array of 1 to ${BATCH_LIMIT} emails.`;
    return { answer: mailError({ status: 422, name: "validation_error", message }), messages: [] };
  }
  const messages: StoredMessage[] = [];
  const errors: Array<{ index: number; message: string }> = [];
  for (const [index, item] of value.entries()) {
    const checked = checkEmail(item);
    if ("email" in checked)
      messages.push(toStoredMessage({ email: checked.email, idempotencyKey }));
    else if (!permissive) {
      return {
        answer: mailError({
          status: 422,
          name: checked.problem.name,
          message: `emails[${index}]: ${checked.problem.message}`,
        }),
        messages: [],
      };
    } else errors.push({ index, message: checked.problem.message });
  }
  const body = {
    data: messages.map((message) => ({ id: message.id })),
    ...(permissive ? { errors } : {}),
  };
  return { answer: { status: 200, body }, messages };
}

function sendEmails({
  store,
  path,
  headers,
  body,
}: {
  store: MessageStore;
  path: string;
  headers: IncomingHttpHeaders;
  body: string;
}): MailAnswer {
  const rawKey = headers["idempotency-key"];
  const idempotencyKey = typeof rawKey === "string" ? rawKey : null;
  if (idempotencyKey !== null && (idempotencyKey.length < 1 || idempotencyKey.length > 256)) {
    return mailError({
      status: 400,
      name: "invalid_idempotency_key",
      message: "The key must be between 1-256 chars.",
    });
  }
  const fingerprint = `${path} ${body}`;
  const scopedKey = idempotencyKey && `${headers.authorization ?? ""} ${idempotencyKey}`;
  const kept = scopedKey ? store.recall(scopedKey) : null;
  if (kept && kept.fingerprint !== fingerprint) {
    return mailError({
      status: 409,
      name: "invalid_idempotent_request",
      message:
        "Same idempotency key used with a different request payload. Change your idempotency key or don't change your payload.",
    });
  }
  if (kept) return { status: kept.status, body: kept.body };
  const parsed = parseJson(body);
  if ("answer" in parsed) return parsed.answer;
  const batch = path === "/emails/batch";
  const permissive = headers["x-batch-validation"] === "permissive";
  const { answer, messages } = acceptEmails({
    value: parsed.value,
    batch,
    permissive,
    idempotencyKey,
  });
  if (answer.status !== 200) return answer;
  store.add(
    messages,
    scopedKey ? { key: scopedKey, answer: { fingerprint, ...answer } } : undefined,
  );
  return answer;
}

export function handleMailApi({
  store,
  method,
  path,
  headers,
  body,
  apiKey,
}: {
  store: MessageStore;
  method: string;
  path: string;
  headers: IncomingHttpHeaders;
  body: string;
  apiKey: string | undefined;
}): MailAnswer {
  if (path !== "/emails" && !path.startsWith("/emails/")) {
    return mailError({
      status: 404,
      name: "not_found",
      message: "The requested endpoint does not exist.",
    });
  }
  const refused = checkApiKey(headers, apiKey);
  if (refused) return refused;
  if (method === "POST" && (path === "/emails" || path === "/emails/batch")) {
    return sendEmails({ store, path, headers, body });
  }
  if (method === "GET" && path === "/emails") {
    return {
      status: 200,
      body: { object: "list", has_more: false, data: store.list().map(present) },
    };
  }
  const single = /^\/emails\/([^/]+)$/.exec(path);
  if (method === "GET" && single?.[1]) {
    const message = store.get(single[1]);
    return message
      ? { status: 200, body: present(message) }
      : mailError({ status: 404, name: "not_found", message: "Email not found" });
  }
  return mailError({ status: 405, name: "method_not_allowed", message: "Method Not Allowed" });
}
