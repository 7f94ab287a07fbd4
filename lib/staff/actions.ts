"use server";

import { revalidatePath } from "next/cache";
import { action } from "@/lib/http/action";
import { inspectionInputSchema } from "@/lib/staff/inspection-input";
import { recordInspection } from "@/lib/staff/commands/inspections";
import { modelIdSchema, modelInputSchema, updateModelSchema } from "@/lib/staff/model-input";
import {
  createModel,
  publishModel,
  retireModel,
  returnModelToDrafts,
  updateModel,
} from "@/lib/staff/commands/models";
import { photoAltSchema, photoIdSchema, reorderPhotosSchema } from "@/lib/staff/photo-input";
import { removeModelPhoto, reorderModelPhotos, updatePhotoAlt } from "@/lib/staff/commands/photos";
import { adjustStock, receiveStock } from "@/lib/staff/commands/stock";
import { adjustStockSchema, receiveStockSchema } from "@/lib/staff/stock-input";

// The workshop's server actions: models, inspections, photos and stock. Each checks the session
// and role on the server (`action`). Photo uploads go through the JSON route
// (app/api/staff/models/[slug]/photos) for per-file progress; the rest are small changes made here.

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

export const recordInspectionAction = action(
  { permission: "staff:inspections" },
  inspectionInputSchema,
  async (input, user) => {
    const recorded = await recordInspection({ input, recordedById: user!.id });
    refresh();
    return recorded;
  },
);

export const removePhotoAction = action(
  { permission: "staff:models" },
  photoIdSchema,
  async ({ id }) => {
    const removed = await removeModelPhoto({ id });
    refresh();
    return removed;
  },
);

export const reorderPhotosAction = action(
  { permission: "staff:models" },
  reorderPhotosSchema,
  async (input) => {
    await reorderModelPhotos({ input });
    refresh();
    return { modelId: input.modelId };
  },
);

export const updatePhotoAltAction = action(
  { permission: "staff:models" },
  photoAltSchema,
  async (input) => {
    const photo = await updatePhotoAlt({ input });
    refresh();
    return photo;
  },
);

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
