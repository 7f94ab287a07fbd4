import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from "node:fs";
import path from "node:path";
import { createUuid } from "../shared/ids";
import { parseMailbox, type EmailInput } from "./email-schema";

/**
 * Messages the mail stand-in accepted, newest last, plus the answers kept for idempotency keys.
 * With a `dataFile` everything is written through to JSON (atomically: temp file, then rename)
 * so restarting the stand-in keeps the inbox.
 */

export interface StoredMessage {
  id: string;
  object: "email";
  created_at: string;
  from: string;
  to: string[];
  cc: string[] | null;
  bcc: string[] | null;
  reply_to: string[] | null;
  subject: string;
  html: string | null;
  text: string | null;
  headers: Record<string, string> | null;
  tags: Array<{ name: string; value: string }> | null;
  attachments: Array<{ filename: string | null; content_type: string | null; size: number }>;
  scheduled_at: null;
  last_event: "delivered";
  /** Not part of the API's answer: shown in the inbox to trace outbox retries. */
  idempotency_key: string | null;
}

export interface KeptAnswer {
  fingerprint: string;
  status: number;
  body: unknown;
}

interface FileShape {
  version: 1;
  messages: StoredMessage[];
  idempotency: Record<string, KeptAnswer>;
}

export function toStoredMessage({
  email,
  idempotencyKey,
}: {
  email: EmailInput;
  idempotencyKey: string | null;
}): StoredMessage {
  return {
    id: createUuid(),
    object: "email",
    created_at: new Date().toISOString(),
    from: email.from,
    to: email.to,
    cc: email.cc ?? null,
    bcc: email.bcc ?? null,
    reply_to: email.reply_to ?? null,
    subject: email.subject,
    html: email.html ?? null,
    text: email.text ?? null,
    headers: email.headers ?? null,
    tags: email.tags ?? null,
    attachments: (email.attachments ?? []).map((attachment) => ({
      filename: attachment.filename ?? null,
      content_type: attachment.content_type ?? null,
      // Base64 content: 3 bytes per 4 characters; the stand-in keeps the size, not the file.
      size: Math.floor(((attachment.content ?? "").replace(/=+$/, "").length * 3) / 4),
    })),
    scheduled_at: null,
    last_event: "delivered",
    idempotency_key: idempotencyKey,
  };
}

/** Everyone a message went to, for the inbox list. */
export function listRecipients(message: StoredMessage): string {
  return message.to.map((recipient) => parseMailbox(recipient)?.email ?? recipient).join(", ");
}

function loadFile(dataFile: string): FileShape {
  const empty: FileShape = { version: 1, messages: [], idempotency: {} };
  if (!existsSync(dataFile)) return empty;
  try {
    const parsed = JSON.parse(readFileSync(dataFile, "utf8")) as Partial<FileShape>;
    return { version: 1, messages: parsed.messages ?? [], idempotency: parsed.idempotency ?? {} };
  } catch {
    // Keep the damaged file for a look instead of overwriting it, and start empty.
    const aside = `${dataFile}.unreadable-${Date.now()}`;
    renameSync(dataFile, aside);
    process.stderr.write(`mail stand-in: ${dataFile} was unreadable; moved it to ${aside}\n`);
    return empty;
  }
}

export function createMessageStore({ dataFile }: { dataFile?: string }) {
  const state: FileShape = dataFile
    ? loadFile(dataFile)
    : { version: 1, messages: [], idempotency: {} };
  const save = () => {
    if (!dataFile) return;
    mkdirSync(path.dirname(dataFile), { recursive: true });
    const temporary = `${dataFile}.${process.pid}.tmp`;
    writeFileSync(temporary, JSON.stringify(state, null, 2));
    renameSync(temporary, dataFile);
  };

  return {
    /** Newest first, as an inbox shows them. */
    list: (): StoredMessage[] => [...state.messages].reverse(),
    get: (id: string) => state.messages.find((message) => message.id === id) ?? null,
    add(messages: StoredMessage[], kept?: { key: string; answer: KeptAnswer }) {
      state.messages.push(...messages);
      if (kept) state.idempotency[kept.key] = kept.answer;
      save();
    },
    recall: (key: string): KeptAnswer | null => state.idempotency[key] ?? null,
    clear() {
      state.messages = [];
      state.idempotency = {};
      save();
    },
  };
}

export type MessageStore = ReturnType<typeof createMessageStore>;
