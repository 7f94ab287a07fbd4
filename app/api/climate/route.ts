import { climateQuerySchema, resolveClimate } from "@/lib/catalog/climate-service";
import { parseQuery, route } from "@/lib/http/route";

export const dynamic = "force-dynamic";

// Public: ZIP code or July high (°F or °C) → climate band, with the stations used for a ZIP.
export const GET = route({ public: true }, async ({ request }) => resolveClimate(parseQuery(request, climateQuerySchema)));
