import { catalogQuerySchema } from "@/lib/catalog/catalog-query";
import { toHouseCard } from "@/lib/catalog/house-card";
import { listHouses } from "@/lib/catalog/queries";
import { parseQuery, route } from "@/lib/http/route";
import { withOccupancyMarks } from "@/lib/roost-reports/catalog-marks";

export const dynamic = "force-dynamic";

// Public: the catalog, filtered; a band adds a fit label to every item.
export const GET = route({ public: true }, async ({ request }) => {
  const query = parseQuery(request, catalogQuerySchema);
  const items = await listHouses(query);
  return { items: await withOccupancyMarks(items.map(toHouseCard)), total: items.length };
});
