import { shipBoxSchema } from "@/lib/fulfillment/schemas";
import { shipBox } from "@/lib/fulfillment/commands/transitions";
import { parseJson, route } from "@/lib/http/route";


// Hands one box to a carrier; the order is shipped when its last box is.
export const POST = route<{ id: string; boxId: string }>({ permission: "fulfillment:orders" }, async ({ request, params, user }) => {
  const input = await parseJson(request, shipBoxSchema);
  const result = await shipBox({ orderId: params.id, parcelId: params.boxId, ...input, actor: user! });
  return {
    id: result.order.id,
    status: result.order.status,
    version: result.order.version,
    orderShipped: result.orderShipped,
    box: { id: result.box.id, carrier: result.box.carrier, trackingNumber: result.box.trackingNumber },
  };
});
