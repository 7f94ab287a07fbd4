import { parseJson, route } from "@/lib/http/route";
import { placementInputSchema } from "@/lib/placement/schema";
import { checkSite } from "@/lib/placement/site-service";


// Public: a planned site → its band, sun on the face, the ten rules and the overall label.
export const POST = route({ public: true }, async ({ request }) =>
  checkSite(await parseJson(request, placementInputSchema)),
);
