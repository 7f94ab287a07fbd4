import { transitionSchema } from "@/lib/fulfillment/schemas";
import { transitionOrder } from "@/lib/fulfillment/commands/transitions";
import { parseJson, route } from "@/lib/http/route";


// One step forward, or an admin's correction one step back with a reason (checked by the state machine).
export const POST = route<{ id: string }>({ permission: "fulfillment:orders" }, async ({ request, params, user }) => {
  const input = await parseJson(request, transitionSchema);
  const order = await transitionOrder({ orderId: params.id, ...input, actor: user! });
  return { id: order.id, status: order.status, version: order.version };
});
