import { quoteCart } from "@/lib/checkout/queries/quote";
import { quoteRequestSchema } from "@/lib/checkout/schemas";
import { parseJson, route } from "@/lib/http/route";


// Public: prices a cart from the database; any price or total in the body is ignored.
export const POST = route({ public: true }, async ({ request }) => {
  const input = await parseJson(request, quoteRequestSchema);
  return quoteCart(input);
});
