import { z } from "zod";
import { getSessionUser } from "@/lib/auth/session";
import { getOrderForViewer } from "@/lib/checkout/queries/order-access";
import { holdForPayment } from "@/lib/checkout/commands/orders";
import { parseJson, route } from "@/lib/http/route";


const bodySchema = z.object({ token: z.string().max(200).optional() });

// Before each payment attempt: hold the order's stock again if a failed attempt released it.
export const POST = route<{ orderId: string }>({ public: true }, async ({ request, params }) => {
  const { token } = await parseJson(request, bodySchema);
  const order = await getOrderForViewer({ orderId: params.orderId, token, user: await getSessionUser() });
  const held = await holdForPayment(order);
  return { orderId: held.id, reservedUntil: held.reservedUntil, totalCents: held.totalCents };
});
