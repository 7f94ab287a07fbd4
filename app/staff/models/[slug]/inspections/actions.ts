"use server";

import { revalidatePath } from "next/cache";
import { action } from "@/lib/http/action";
import { inspectionInputSchema } from "@/lib/staff/inspection-input";
import { recordInspection } from "@/lib/staff/inspections";

export const recordInspectionAction = action(
  { permission: "staff:inspections" },
  inspectionInputSchema,
  async (input, user) => {
    const recorded = await recordInspection({ input, recordedById: user!.id });
    revalidatePath("/staff", "layout");
    revalidatePath("/houses", "layout");
    return recorded;
  },
);
