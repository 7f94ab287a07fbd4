import { AppError } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { getStaffModelBySlug, listStockMovements } from "@/lib/staff/queries/model";


// One model's stock ledger, newest first.
export const GET = route<{ slug: string }>({ permission: "staff:stock" }, async ({ params }) => {
  const model = await getStaffModelBySlug({ slug: params.slug });
  if (!model) throw new AppError("not_found", "There is no house model at that address.");
  const items = await listStockMovements({ modelId: model.row.id });
  return {
    model: { id: model.row.id, slug: model.row.slug, name: model.row.name, stock: model.row.stock },
    items,
  };
});
