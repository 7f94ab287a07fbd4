"use server";

import { revalidatePath } from "next/cache";
import { action } from "@/lib/http/action";
import { modelIdSchema, modelInputSchema, updateModelSchema } from "@/lib/staff/model-input";
import {
  createModel,
  publishModel,
  retireModel,
  returnModelToDrafts,
  updateModel,
} from "@/lib/staff/models";

// Staff pages and the public catalog both show models; every change refreshes both.
function refresh() {
  revalidatePath("/staff", "layout");
  revalidatePath("/houses", "layout");
}

export const createModelAction = action(
  { permission: "staff:models" },
  modelInputSchema,
  async (input) => {
    const created = await createModel({ input });
    refresh();
    return created;
  },
);

export const updateModelAction = action(
  { permission: "staff:models" },
  updateModelSchema,
  async (input) => {
    const saved = await updateModel({ input });
    refresh();
    return saved;
  },
);

export const publishModelAction = action(
  { permission: "staff:models" },
  modelIdSchema,
  async ({ id }) => {
    const published = await publishModel({ id });
    refresh();
    return published;
  },
);

export const retireModelAction = action(
  { permission: "staff:models" },
  modelIdSchema,
  async ({ id }) => {
    const retired = await retireModel({ id });
    refresh();
    return retired;
  },
);

export const returnModelToDraftsAction = action(
  { permission: "staff:models" },
  modelIdSchema,
  async ({ id }) => {
    const drafted = await returnModelToDrafts({ id });
    refresh();
    return drafted;
  },
);
