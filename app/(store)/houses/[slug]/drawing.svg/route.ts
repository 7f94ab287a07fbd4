import { houseDrawingSvg } from "@/lib/catalog/drawing";
import { cachedDrawing } from "@/lib/catalog/cached";
import { getHouseBySlug } from "@/lib/catalog/queries";
import { getSessionUser } from "@/lib/auth/session";
import { can } from "@/lib/auth/roles";
import { gated } from "@/lib/http/route";

// The generated drawing of a model; drafts only for staff.
export const GET = gated(async (_request: Request, { params }: { params: Promise<{ slug: string }> }) => {
  const { slug } = await params;
  // A published model's drawing comes from the cache; a draft's is drawn afresh, for staff only.
  let svg = await cachedDrawing(slug);
  if (svg === null) {
    const user = await getSessionUser();
    const draft = user && can(user.role, "staff:models") ? await getHouseBySlug({ slug, includeUnpublished: true }) : null;
    if (draft) svg = houseDrawingSvg({ name: draft.name, spec: draft.spec });
  }
  if (svg === null) return new Response("Not found", { status: 404 });
  return new Response(svg, {
    headers: {
      "content-type": "image/svg+xml; charset=utf-8",
      "cache-control": "public, max-age=300",
      // The SVG is ours, but it is served as a document too: no scripts, ever.
      "content-security-policy": "default-src 'none'; style-src 'unsafe-inline'",
    },
  });
});
