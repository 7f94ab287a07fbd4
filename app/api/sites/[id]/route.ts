import { getSessionUser } from "@/lib/auth/session";
import { AppError } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { GUEST_SITE_TOKEN_HEADER } from "@/lib/placement/saved-site-schema";
import { deleteSiteForViewer } from "@/lib/placement/commands";
import { getSiteForViewer } from "@/lib/placement/queries";
import type { SiteViewer } from "@/lib/placement/sites";


type Params = { id: string };

async function viewerOf(request: Request): Promise<SiteViewer> {
  const user = await getSessionUser();
  return { userId: user?.id ?? null, guestToken: request.headers.get(GUEST_SITE_TOKEN_HEADER) };
}

// Someone else's site answers exactly like a missing one, so ids reveal nothing.
const notFound = () => new AppError("not_found", "We could not find that saved site.");

export const GET = route<Params>({ public: true }, async ({ request, params }) => {
  const site = await getSiteForViewer({ id: params.id, viewer: await viewerOf(request) });
  if (!site) throw notFound();
  const { id, name, input, result, label, bandId, skyline, createdAt } = site;
  return { id, name, input, result, label, bandId, skyline, createdAt: createdAt.toISOString() };
});

export const DELETE = route<Params>({ public: true }, async ({ request, params }) => {
  const outcome = await deleteSiteForViewer({ id: params.id, viewer: await viewerOf(request) });
  if (outcome === "not_found") throw notFound();
  if (outcome === "in_use") {
    throw new AppError(
      "conflict",
      "This site went with an order, so we keep it for that order's install guide.",
    );
  }
  return { deleted: true };
});
