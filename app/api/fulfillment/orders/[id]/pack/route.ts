import { packSchema } from "@/lib/fulfillment/schemas";
import { packOrder } from "@/lib/fulfillment/commands/transitions";
import { parseJson, route } from "@/lib/http/route";


// Records the boxes (billable weight computed on the server) and marks the order boxed and weighed.
export const POST = route<{ id: string }>({ permission: "fulfillment:orders" }, async ({ request, params, user }) => {
  const input = await parseJson(request, packSchema);
  const order = await packOrder({ orderId: params.id, version: input.version, boxes: input.boxes, actor: user! });
  return { id: order.id, status: order.status, version: order.version };
});
