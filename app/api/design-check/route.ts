import { checkDesign } from "@/lib/catalog/design-check";
import { houseSpecSchema } from "@/lib/catalog/spec";
import { parseJson, route } from "@/lib/http/route";

// Public: anyone can check a house they built against the design criteria.
export const POST = route({ public: true }, async ({ request }) => {
  const spec = await parseJson(request, houseSpecSchema);
  const { results, publishable } = checkDesign(spec);
  return { results, publishable };
});
