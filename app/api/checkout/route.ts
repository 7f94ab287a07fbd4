import { getSessionUser } from "@/lib/auth/session";
import { startCheckout } from "@/lib/checkout/commands/orders";
import { checkoutRequestSchema } from "@/lib/checkout/schemas";
import { parseJson, route } from "@/lib/http/route";

export const dynamic = "force-dynamic";

// Guests and signed-in buyers: creates the order, reserves stock and the PaymentIntent.
export const POST = route({ public: true }, async ({ request }) => {
  const input = await parseJson(request, checkoutRequestSchema);
  return startCheckout(input, await getSessionUser());
});
