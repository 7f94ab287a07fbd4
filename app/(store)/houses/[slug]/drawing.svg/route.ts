import { houseDrawingSvg } from "@/lib/catalog/drawing";
import { getHouseBySlug } from "@/lib/catalog/queries";
import { getSessionUser } from "@/lib/auth/session";
import { can } from "@/lib/auth/roles";
import { gated } from "@/lib/http/route";

export const dynamic = "force-dynamic";

// The generated drawing of a model; drafts only for staff.
export const GET = gated(async (_request: Request, { params }: { params: Promise<{ slug: string }> }) => {
  const { slug } = await params;
  const user = await getSessionUser();
  const house = await getHouseBySlug({ slug, includeUnpublished: Boolean(user && can(user.role, "staff:models")) });
  if (!house) return new Response("Not found", { status: 404 });
  return new Response(houseDrawingSvg({ name: house.name, spec: house.spec }), {
    headers: {
      "content-type": "image/svg+xml; charset=utf-8",
      "cache-control": "public, max-age=300",
      // The SVG is ours, but it is served as a document too: no scripts, ever.
      "content-security-policy": "default-src 'none'; style-src 'unsafe-inline'",
    },
  });
});
