import { env } from "@/lib/config/env";
import { buildUnsubscribeHeaders } from "./unsubscribe-headers";

/**
 * The two ways out of seasonal reminders: a page with one button (the link in the message; a
 * page, because mail scanners follow links and must not unsubscribe anyone by looking), and
 * the RFC 8058 one-click POST target named in the List-Unsubscribe header.
 */
export function unsubscribeLinks({ token }: { token: string }) {
  const base = env().APP_URL;
  const query = `token=${encodeURIComponent(token)}`;
  return {
    pageUrl: `${base}/unsubscribe?${query}`,
    headers: buildUnsubscribeHeaders({ url: `${base}/api/account/unsubscribe?${query}` }),
  };
}
