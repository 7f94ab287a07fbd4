import { getSessionUser } from "@/lib/auth/session";
import { startMonthlyGift } from "@/lib/giving/commands/monthly";
import { startMonthlySchema } from "@/lib/giving/monthly-schemas";
import { parseJson, route } from "@/lib/http/route";


// Guests and signed-in donors: opens the subscription and returns its first payment's secret.
export const POST = route({ public: true }, async ({ request }) => {
  const input = await parseJson(request, startMonthlySchema);
  return startMonthlyGift(input, await getSessionUser());
});
