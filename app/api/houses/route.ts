import { catalogQuerySchema } from "@/lib/catalog/catalog-query";
import { catalogCards } from "@/lib/catalog/buyer-view";
import { parseQuery, route } from "@/lib/http/route";

// Public: the catalog, filtered; a band adds a fit label to every item. Read from the cached
// catalog (lib/catalog/cached.ts), so it never waits on the database.
export const GET = route({ public: true }, async ({ request }) => catalogCards(parseQuery(request, catalogQuerySchema)));
