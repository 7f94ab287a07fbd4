import { listRecipients, type StoredMessage } from "./message-store";

/**
 * The stand-in's own inbox pages: a developer tool, so plain, legible and self-contained.
 * The message's HTML is shown in a sandboxed iframe (no scripts, no same-origin) via srcdoc.
 */

export function escapeHtml(value: string): string {
  return value
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}

const STYLE = `
  :root { color-scheme: light; }
  * { box-sizing: border-box; }
  body { margin: 0; font: 16px/1.5 system-ui, -apple-system, "Segoe UI", sans-serif; color: #1f2a24; background: #f6f5f1; }
  main { max-width: 60rem; margin: 0 auto; padding: 1.5rem 1rem 3rem; }
  h1 { font-size: 1.5rem; margin: 0 0 .25rem; }
  h2 { font-size: 1.1rem; margin: 2rem 0 .5rem; }
  p.note { margin: 0 0 1.25rem; color: #4a5a50; }
  a { color: #1d5c46; }
  a:focus-visible { outline: 3px solid #1d5c46; outline-offset: 2px; border-radius: 2px; }
  .banner { background: #fff4d6; border: 1px solid #d8b04a; padding: .75rem 1rem; border-radius: .5rem; margin-bottom: 1rem; }
  table { width: 100%; border-collapse: collapse; background: #fff; border: 1px solid #dcd8cc; border-radius: .5rem; }
  th, td { text-align: left; padding: .6rem .8rem; border-bottom: 1px solid #ebe7dc; vertical-align: top; }
  th { font-size: .85rem; text-transform: uppercase; letter-spacing: .04em; color: #4a5a50; }
  td.time { white-space: nowrap; color: #4a5a50; }
  dl { display: grid; grid-template-columns: max-content 1fr; gap: .35rem 1rem; background: #fff; border: 1px solid #dcd8cc; border-radius: .5rem; padding: 1rem; margin: 0; }
  dt { font-weight: 600; color: #4a5a50; }
  dd { margin: 0; overflow-wrap: anywhere; white-space: pre-line; }
  iframe { width: 100%; height: 36rem; border: 1px solid #dcd8cc; border-radius: .5rem; background: #fff; }
  pre { white-space: pre-wrap; overflow-wrap: anywhere; background: #fff; border: 1px solid #dcd8cc; border-radius: .5rem; padding: 1rem; font-size: .95rem; }
`;

function layout({ title, body }: { title: string; body: string }): string {
  return `<!doctype html>
<html lang="en">
<head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title><style>${STYLE}</style></head>
<body><main>${body}</main></body>
</html>`;
}

function formatTime(iso: string): string {
  return new Date(iso).toLocaleString("en-US", { dateStyle: "medium", timeStyle: "medium" });
}

function downBanner(down: boolean): string {
  return down
    ? `<p class="banner">The stand-in is switched <strong>down</strong>: every API call answers 503 until <code>POST /_stand-in/up</code>.</p>`
    : "";
}

export function renderInboxPage({
  messages,
  down,
}: {
  messages: StoredMessage[];
  down: boolean;
}): string {
  const rows = messages
    .map(
      (message) => `<tr>
  <td class="time"><time datetime="${message.created_at}">${escapeHtml(formatTime(message.created_at))}</time></td>
  <td>${escapeHtml(listRecipients(message))}</td>
  <td><a href="/messages/${encodeURIComponent(message.id)}">${escapeHtml(message.subject)}</a></td>
</tr>`,
    )
    .join("\n");
  const table = messages.length
    ? `<table><thead><tr><th scope="col">Received</th><th scope="col">To</th><th scope="col">Subject</th></tr></thead><tbody>${rows}</tbody></table>`
    : `<p>No messages yet. Mail the store sends will appear here.</p>`;
  const count = `${messages.length} message${messages.length === 1 ? "" : "s"}`;
  return layout({
    title: `Inbox (${messages.length}) · local mail stand-in`,
    body: `<h1>Inbox</h1>
<p class="note">Local mail stand-in: nothing here leaves this machine. ${count}, newest first. <a href="/">Refresh</a></p>
${downBanner(down)}${table}`,
  });
}

function field(label: string, value: string | null | undefined): string {
  return value ? `<dt>${escapeHtml(label)}</dt><dd>${escapeHtml(value)}</dd>` : "";
}

export function renderMessagePage({ message }: { message: StoredMessage }): string {
  const headers = Object.entries(message.headers ?? {}).map(([name, value]) => `${name}: ${value}`);
  const tags = (message.tags ?? []).map((tag) => `${tag.name}=${tag.value}`);
  const attachments = message.attachments.map(
    (file) => `${file.filename ?? "unnamed"} (${file.size} bytes)`,
  );
  const details = [
    field("From", message.from),
    field("To", message.to.join(", ")),
    field("Cc", message.cc?.join(", ")),
    field("Bcc", message.bcc?.join(", ")),
    field("Reply-To", message.reply_to?.join(", ")),
    field("Received", formatTime(message.created_at)),
    field("Message id", message.id),
    field("Idempotency key", message.idempotency_key),
    field("Tags", tags.join(", ")),
    field("Headers", headers.join("\n")),
    field("Attachments", attachments.join(", ")),
  ].join("");
  const preview = message.html
    ? `<iframe title="HTML version of the message" sandbox="" referrerpolicy="no-referrer" srcdoc="${escapeHtml(message.html)}"></iframe>`
    : `<p>No HTML version was sent.</p>`;
  const text = message.text
    ? `<pre>${escapeHtml(message.text)}</pre>`
    : `<p>No plain-text version was sent.</p>`;
  return layout({
    title: `${message.subject} · local mail stand-in`,
    body: `<p><a href="/">← Inbox</a></p>
<h1>${escapeHtml(message.subject)}</h1>
<p class="note">As the store handed it to the mail API.</p>
<dl>${details}</dl>
<h2>HTML</h2>${preview}
<h2>Plain text</h2>${text}`,
  });
}

export function renderNotFoundPage(): string {
  return layout({
    title: "Not found · local mail stand-in",
    body: `<h1>Not found</h1><p><a href="/">← Inbox</a></p>`,
  });
}
