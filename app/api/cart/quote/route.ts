import { getDb } from "@/db/client";
import { quoteFromDatabase } from "@/lib/checkout/quote-service";
import { quoteRequestSchema } from "@/lib/checkout/schemas";
import { parseJson, route } from "@/lib/http/route";

export const dynamic = "force-dynamic";

// Public: prices a cart from the database; any price or total in the body is ignored.
export const POST = route({ public: true }, async ({ request }) => {
  const input = await parseJson(request, quoteRequestSchema);
  const { quote } = await quoteFromDatabase(await getDb(), {
    items: input.items,
    method: input.method,
    state: input.shipTo?.state,
    giftCents: input.giftCents,
  });
  return {
    lines: quote.lines,
    subtotalCents: quote.subtotalCents,
    shipping: { method: quote.shipping.method, parcels: quote.shipping.parcels.map((p) => ({ slug: p.slug, billableLb: p.billableLb, cents: p.cents })), cents: quote.shipping.cents },
    taxCents: quote.taxCents,
    giftCents: quote.giftCents,
    totalCents: quote.totalCents,
  };
});
