import { listQueueOrders } from "@/lib/fulfillment/queries/queue";
import { queueParamsSchema } from "@/lib/fulfillment/queue-params";
import { queueCsvResponse } from "@/lib/fulfillment/queue-response";
import { parseQuery, route } from "@/lib/http/route";


// The shipping desk's queue: one page as JSON, or the whole view as CSV with ?format=csv.
export const GET = route({ permission: "fulfillment:orders" }, async ({ request }) => {
  const params = parseQuery(request, queueParamsSchema);
  if (new URL(request.url).searchParams.get("format") === "csv") return queueCsvResponse(params);
  return listQueueOrders({ params });
});
