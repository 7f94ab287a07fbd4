import { getFulfillmentOrder } from "@/lib/fulfillment/queries/order-detail";
import { AppError } from "@/lib/http/errors";
import { route } from "@/lib/http/route";


// One order as the shipping desk sees it: houses, cartons, boxes, history and its version.
export const GET = route<{ id: string }>({ permission: "fulfillment:orders" }, async ({ params }) => {
  const detail = await getFulfillmentOrder({ orderId: params.id });
  if (!detail) throw new AppError("not_found", "No paid order with that id is waiting at the shipping desk.");
  return detail;
});
