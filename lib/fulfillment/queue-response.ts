import "server-only";
import { listQueueOrdersForExport } from "./queries/queue";
import { queueCsvFileName, queueToCsv } from "./queue-csv";
import type { QueueParams } from "./queue-params";

/** The CSV download of a queue view, shared by `/api/fulfillment/orders.csv` and `?format=csv`. */
export async function queueCsvResponse(params: QueueParams): Promise<Response> {
  const rows = await listQueueOrdersForExport({ params });
  return new Response(queueToCsv(rows), {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${queueCsvFileName(new Date())}"`,
      // Buyer names and addresses: never kept by a shared cache.
      "cache-control": "private, no-store",
    },
  });
}
