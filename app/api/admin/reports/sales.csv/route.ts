import { parseQuery, route } from "@/lib/http/route";
import { csvResponse, salesCsv } from "@/lib/reports/csv";
import { loadFigures, loadReportRange } from "@/lib/reports/queries";
import { z } from "zod";


const query = z.object({ from: z.string().max(10).optional(), to: z.string().max(10).optional() });

// Sales and gifts by month for the range in the address (admins only: money and donors).
export const GET = route({ permission: "admin:settings" }, async ({ request }) => {
  const range = await loadReportRange(parseQuery(request, query));
  const figures = await loadFigures(range, range.timeZone);
  return csvResponse(salesCsv(figures), `sales-and-gifts-${range.from}-to-${range.to}.csv`);
});
