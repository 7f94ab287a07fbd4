import { route } from "@/lib/http/route";
import { csvResponse, stockCsv } from "@/lib/reports/csv";
import { loadStock } from "@/lib/reports/queries";


// Stock on hand and its value at list price (the workshop's part: staff and admins).
export const GET = route({ permission: "staff:stock" }, async () => csvResponse(stockCsv(await loadStock()), "stock.csv"));
