import { getSessionUser } from "@/lib/auth/session";
import { startGiftOnce } from "@/lib/giving/commands/once";
import { giveOnceSchema } from "@/lib/giving/once-schemas";
import { parseJson, route } from "@/lib/http/route";


// A gift on its own with a tribute or the card fee covered; the payment is the ordinary checkout's.
export const POST = route({ public: true }, async ({ request }) => {
  const input = await parseJson(request, giveOnceSchema);
  return startGiftOnce(input, await getSessionUser());
});
