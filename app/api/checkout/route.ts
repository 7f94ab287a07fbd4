import { getSessionUser } from "@/lib/auth/session";
import { startCheckout } from "@/lib/checkout/commands/orders";
import { bandChoiceFromCookieHeader } from "@/lib/climate/band-cookie-parse";
import { orderBandFromChoice } from "@/lib/climate/order-band";
import { checkoutRequestSchema } from "@/lib/checkout/schemas";
import { parseJson, route } from "@/lib/http/route";


// Guests and signed-in buyers: creates the order, reserves stock and the PaymentIntent.
export const POST = route({ public: true }, async ({ request }) => {
  const input = await parseJson(request, checkoutRequestSchema);
  // The band the buyer saw travels with the order, read on the server from the one band cookie.
  return startCheckout(input, await getSessionUser(), new Date(), orderBandFromChoice(bandChoiceFromCookieHeader(request.headers.get("cookie"))));
});
