import { queueParamsSchema } from "@/lib/fulfillment/queue-params";
import { queueCsvResponse } from "@/lib/fulfillment/queue-response";
import { parseQuery, route } from "@/lib/http/route";


// The current queue view (filters and sort, every page) as a spreadsheet.
export const GET = route({ permission: "fulfillment:orders" }, async ({ request }) =>
  queueCsvResponse(parseQuery(request, queueParamsSchema)),
);
