"use server";

import { revalidatePath } from "next/cache";
import { action } from "@/lib/http/action";
import { adjustStock, receiveStock } from "@/lib/staff/stock";
import { adjustStockSchema, receiveStockSchema } from "@/lib/staff/stock-input";

function refresh() {
  revalidatePath("/staff", "layout");
  revalidatePath("/houses", "layout");
}

export const receiveStockAction = action(
  { permission: "staff:stock" },
  receiveStockSchema,
  async (input, user) => {
    const moved = await receiveStock({ input, actorId: user!.id });
    refresh();
    return moved;
  },
);

export const adjustStockAction = action(
  { permission: "staff:stock" },
  adjustStockSchema,
  async (input, user) => {
    const moved = await adjustStock({ input, actorId: user!.id });
    refresh();
    return moved;
  },
);
