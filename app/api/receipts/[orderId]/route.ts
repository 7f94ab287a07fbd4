import { getSessionUser } from "@/lib/auth/session";
import { getOrderForViewer } from "@/lib/checkout/queries/order-access";
import { getOrderReceipt } from "@/lib/checkout/queries/receipt";
import { AppError } from "@/lib/http/errors";
import { route } from "@/lib/http/route";


// The buyer (signed in, or with the order's link token `?t=`) and staff who handle orders.
export const GET = route<{ orderId: string }>({ public: true }, async ({ request, params }) => {
  const token = new URL(request.url).searchParams.get("t");
  const order = await getOrderForViewer({ orderId: params.orderId, token, user: await getSessionUser() });
  if (!order.paidAt) throw new AppError("conflict", "This order is not paid yet, so it has no receipt.");
  const r = await getOrderReceipt(order);
  return {
    kind: r.kind,
    amountPaidCents: r.amountPaidCents,
    goodsValueCents: r.goodsValueCents,
    salesTaxCents: r.salesTaxCents,
    deductibleCents: r.deductibleCents,
    disclosureRequired: r.disclosureRequired,
    acknowledgmentRequired: r.acknowledgmentRequired,
    refundedCents: r.refundedCents,
    statements: r.statements,
    organization: r.organization,
    date: r.date,
  };
});
