import { getSessionUser } from "@/lib/auth/session";
import { getOrderForViewer } from "@/lib/checkout/queries/order-access";
import { formatOrderNumber } from "@/lib/checkout/order-number";
import { getOrderHistory, getOrderLines } from "@/lib/orders/queries";
import { route } from "@/lib/http/route";


// The buyer's view of one order (signed in as its buyer, or with its link token `?t=`).
export const GET = route<{ id: string }>({ public: true }, async ({ request, params }) => {
  const token = new URL(request.url).searchParams.get("t");
  const order = await getOrderForViewer({ orderId: params.id, token, user: await getSessionUser() });
  const [lines, history] = await Promise.all([getOrderLines({ orderId: order.id }), getOrderHistory({ orderId: order.id })]);
  return {
    id: order.id,
    number: formatOrderNumber(order.number),
    status: order.status,
    method: order.method,
    lines: lines.map((l) => ({ slug: l.slug, name: l.name, quantity: l.quantity, unitPriceCents: l.unitPriceCents })),
    subtotalCents: order.subtotalCents,
    shippingCents: order.shippingCents,
    taxCents: order.taxCents,
    giftCents: order.giftCents,
    totalCents: order.totalCents,
    refundedCents: order.refundedCents,
    paidAt: order.paidAt,
    // Notes are staff-facing (correction reasons); the buyer sees states and times only.
    history: history.map((h) => ({ from: h.fromStatus, to: h.toStatus, at: h.createdAt })),
  };
});
