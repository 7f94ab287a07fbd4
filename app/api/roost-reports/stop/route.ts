import { NextResponse } from "next/server";
import { parseQuery, route } from "@/lib/http/route";
import { stopFromLink } from "@/lib/roost-reports/link-answers";
import { optOutSchema } from "@/lib/roost-reports/report-input";


// RFC 8058 one-click: a mail program POSTs "List-Unsubscribe=One-Click" to the header's URL; the
// signed token in it names the order and address, so no cookie is needed.
export const POST = route({ public: true }, async ({ request }) => {
  const { token } = parseQuery(request, optOutSchema);
  await stopFromLink({ token });
  return { stopped: true };
});

// A person who opens the header's URL in a browser gets the page with its button.
export const GET = route({ public: true }, async ({ request }) => {
  const token = new URL(request.url).searchParams.get("token") ?? "";
  return NextResponse.redirect(new URL(`/roost-reports/stop?token=${encodeURIComponent(token)}`, request.url), 303);
});
