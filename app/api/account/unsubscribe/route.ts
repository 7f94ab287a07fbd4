import { NextResponse } from "next/server";
import { parseQuery, route } from "@/lib/http/route";
import { AppError } from "@/lib/http/errors";
import { unsubscribeSchema } from "@/lib/mail/account-schemas";
import { unsubscribeByToken } from "@/lib/mail/commands/preferences";


// RFC 8058 one-click: a mail program POSTs "List-Unsubscribe=One-Click" to the URL of the
// List-Unsubscribe header; the token in the URL names the subscription, no cookie is needed.
export const POST = route({ public: true }, async ({ request }) => {
  const { token } = parseQuery(request, unsubscribeSchema);
  if ((await unsubscribeByToken({ token })) === "unknown")
    throw new AppError("not_found", "This unsubscribe link is not one of ours.");
  return { unsubscribed: true };
});

// A person who opens the header's URL in a browser gets the page with its button.
export const GET = route({ public: true }, async ({ request }) => {
  const token = new URL(request.url).searchParams.get("token") ?? "";
  return NextResponse.redirect(
    new URL(`/unsubscribe?token=${encodeURIComponent(token)}`, request.url),
    303,
  );
});
