import { requireClimate } from "@/lib/climate/queries";
import { climateQuerySchema, toClimateInput } from "@/lib/climate/query-schema";
import { parseQuery, route } from "@/lib/http/route";


// Public: ZIP code, latitude/longitude or a typed warmest-month high (°F or °C) → the climate result.
export const GET = route({ public: true }, async ({ request }) =>
  requireClimate(toClimateInput(parseQuery(request, climateQuerySchema)), { zip: "zip", value: "value" }),
);
