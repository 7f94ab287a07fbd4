import { getSessionUser } from "@/lib/auth/session";
import { AppError } from "@/lib/http/errors";
import { parseJson, route } from "@/lib/http/route";
import { saveSiteSchema, type SavedSiteReceipt } from "@/lib/placement/saved-site-schema";
import { checkSite } from "@/lib/placement/site-service";
import { createSite } from "@/lib/placement/commands";
import { listSitesByUser } from "@/lib/placement/queries";


// Anyone may save a site: to their account when signed in, else under a fresh guest token that
// is answered once and kept by the browser with the cart. The check is run again here, so the
// saved result is the server's own.
export const POST = route({ public: true }, async ({ request }): Promise<SavedSiteReceipt> => {
  const { name, input } = await parseJson(request, saveSiteSchema);
  const user = await getSessionUser();
  const answer = await checkSite(input);
  const { site, guestToken } = await createSite({ name, input, answer, userId: user?.id ?? null });
  return {
    id: site.id,
    name: site.name,
    label: answer.label,
    bandId: answer.band.id,
    julyHighF: answer.climate.julyHighF,
    skyline: answer.sun.skyline.profile,
    ...(answer.location.zip ? { zip: answer.location.zip } : {}),
    ...(guestToken ? { guestToken } : {}),
    createdAt: site.createdAt.toISOString(),
  };
});

// A signed-in buyer's saved sites, newest first.
export const GET = route({ signedIn: true }, async ({ user }) => {
  if (!user) throw new AppError("unauthenticated", "Please sign in first.");
  return { items: await listSitesByUser({ userId: user.id }) };
});
