import { route } from "@/lib/http/route";
import { buildPlanCsv, csvResponse } from "@/lib/reports/csv";
import { loadStockReport } from "@/lib/reports/queries";


// The build plan before next spring (the workshop's part: staff and admins).
export const GET = route({ permission: "staff:stock" }, async () => csvResponse(buildPlanCsv((await loadStockReport()).plan), "build-plan.csv"));
