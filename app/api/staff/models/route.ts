import { parseQuery, route } from "@/lib/http/route";
import { applyModelsQuery, modelsQuerySchema } from "@/lib/staff/models-table-query";
import { listStaffModelRows } from "@/lib/staff/queries/models-table";


// The staff models table: search, filters, sorting and pages, all from the query string.
export const GET = route({ permission: "staff:models" }, async ({ request }) => {
  const query = parseQuery(request, modelsQuerySchema);
  return applyModelsQuery({ rows: await listStaffModelRows(), query });
});
