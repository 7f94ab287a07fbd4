import { cancelOrder } from "@/lib/fulfillment/commands/admin-refunds";
import { cancelSchema } from "@/lib/fulfillment/schemas";
import { parseJson, route } from "@/lib/http/route";


// Admin: cancel an order that has not left, refund it in full and put its houses back in stock.
export const POST = route<{ id: string }>({ permission: "admin:refunds" }, async ({ request, params, user }) => {
  const input = await parseJson(request, cancelSchema);
  const order = await cancelOrder({ orderId: params.id, ...input, actor: user! });
  return { id: order.id, status: order.status, version: order.version, refundedCents: order.refundedCents };
});
