import { refundShippedOrder } from "@/lib/fulfillment/commands/admin-refunds";
import { dollarsToCents, refundSchema } from "@/lib/fulfillment/schemas";
import { parseJson, route } from "@/lib/http/route";


// Admin: refund a shipped or collected order, all or part, without taking stock back.
export const POST = route<{ id: string }>({ permission: "admin:refunds" }, async ({ request, params, user }) => {
  const input = await parseJson(request, refundSchema);
  const order = await refundShippedOrder({
    orderId: params.id,
    version: input.version,
    amountCents: dollarsToCents(input.amount),
    reason: input.reason,
    actor: user!,
  });
  return { id: order.id, status: order.status, version: order.version, refundedCents: order.refundedCents };
});
