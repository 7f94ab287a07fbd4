import { getSessionUser } from "@/lib/auth/session";
import { changeMonthlyAmount, monthlyGiftForDonor, stopMonthlyGift } from "@/lib/giving/commands/monthly";
import { changeMonthlySchema, stopMonthlySchema } from "@/lib/giving/monthly-schemas";
import { parseJson, route } from "@/lib/http/route";


// The donor only: signed in as the gift's donor, or with the private link's token in the body.
// Anyone else gets 404, as if the gift did not exist.

function view(gift: { id: string; status: string; amountCents: number }) {
  return { id: gift.id, status: gift.status, amountCents: gift.amountCents };
}

export const PATCH = route<{ id: string }>({ public: true }, async ({ request, params }) => {
  const input = await parseJson(request, changeMonthlySchema);
  const gift = await monthlyGiftForDonor({ id: params.id, token: input.token, user: await getSessionUser() });
  return view(await changeMonthlyAmount({ gift, amountCents: input.amountCents }));
});

export const DELETE = route<{ id: string }>({ public: true }, async ({ request, params }) => {
  const input = await parseJson(request, stopMonthlySchema);
  const gift = await monthlyGiftForDonor({ id: params.id, token: input.token, user: await getSessionUser() });
  return view(await stopMonthlyGift({ gift }));
});
