import { z } from "zod";
import { BAND_IDS } from "@/lib/catalog/climate-bands";
import { houseForBuyer } from "@/lib/catalog/buyer-view";
import { cachedModelOccupancy } from "@/lib/catalog/cached";
import { AppError } from "@/lib/http/errors";
import { parseQuery, route } from "@/lib/http/route";

const querySchema = z.object({ band: z.enum(BAND_IDS, "Choose a band: cool, warm, hot or very-hot.").optional() });

export const GET = route<{ slug: string }>({ public: true }, async ({ request, params }) => {
  const { band } = parseQuery(request, querySchema);
  const house = await houseForBuyer(params.slug, band);
  if (!house) throw new AppError("not_found", "No house on sale has that name.");
  return {
    slug: house.slug,
    name: house.name,
    tagline: house.tagline,
    description: house.description,
    priceCents: house.priceCents,
    stock: house.stock,
    mounts: house.mounts,
    certified: house.certified,
    certification: house.certification,
    spec: house.spec,
    check: house.check.results,
    publishable: house.check.publishable,
    carton: house.carton,
    ...(house.fit ? { fit: house.fit } : {}),
    occupancy: await cachedModelOccupancy(house.id),
  };
});
