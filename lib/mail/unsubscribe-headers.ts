// Headers that let a mail program offer "unsubscribe" itself, and unsubscribe with one click
// without opening a page: List-Unsubscribe (RFC 2369, 1998) with an HTTPS URL, and
// List-Unsubscribe-Post: List-Unsubscribe=One-Click (RFC 8058, 2017, section 3.1), which tells
// the mail program to POST to that URL. The URL must identify the subscription by itself
// (RFC 8058 section 3.1), so it carries the recipient's unsubscribe token.

export function buildUnsubscribeHeaders({ url }: { url: string }): Record<string, string> {
  const parsed = new URL(url);
  if (parsed.protocol !== "https:" && parsed.protocol !== "http:")
    throw new RangeError("The unsubscribe URL must be http(s).");
  return {
    "List-Unsubscribe": `<${parsed.toString()}>`,
    "List-Unsubscribe-Post": "List-Unsubscribe=One-Click",
  };
}
