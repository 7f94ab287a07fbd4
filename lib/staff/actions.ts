"use server";

import { revalidatePath } from "next/cache";
import type { ModelChange } from "@/lib/catalog/cache-tags";
import { expireModel } from "@/lib/catalog/expire";
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

// Staff pages and the public catalog both show models. Every change refreshes the staff pages and
// expires exactly the buyer-facing cache tags it touches (lib/catalog/expire.ts): the model's own,
// and the catalog's when the model enters or leaves it or is on sale.
async function refresh(modelId: string, change: ModelChange = "details") {
  revalidatePath("/staff", "layout");
  await expireModel(modelId, change, "action");
}

export const createModelAction = action(
  { permission: "staff:models" },
  modelInputSchema,
  async (input) => {
    const created = await createModel({ input });
    await refresh(created.id);
    return created;
  },
);

export const updateModelAction = action(
  { permission: "staff:models" },
  updateModelSchema,
  async (input) => {
    const saved = await updateModel({ input });
    await refresh(saved.id);
    return saved;
  },
);

export const publishModelAction = action(
  { permission: "staff:models" },
  modelIdSchema,
  async ({ id }) => {
    const published = await publishModel({ id });
    await refresh(id, "listing");
    return published;
  },
);

export const retireModelAction = action(
  { permission: "staff:models" },
  modelIdSchema,
  async ({ id }) => {
    const retired = await retireModel({ id });
    await refresh(id, "listing");
    return retired;
  },
);

export const returnModelToDraftsAction = action(
  { permission: "staff:models" },
  modelIdSchema,
  async ({ id }) => {
    const drafted = await returnModelToDrafts({ id });
    await refresh(id, "listing");
    return drafted;
  },
);

export const recordInspectionAction = action(
  { permission: "staff:inspections" },
  inspectionInputSchema,
  async (input, user) => {
    const recorded = await recordInspection({ input, recordedById: user!.id });
    await refresh(input.modelId);
    return recorded;
  },
);

export const removePhotoAction = action(
  { permission: "staff:models" },
  photoIdSchema,
  async ({ id }) => {
    const removed = await removeModelPhoto({ id });
    await refresh(removed.modelId);
    return removed;
  },
);

export const reorderPhotosAction = action(
  { permission: "staff:models" },
  reorderPhotosSchema,
  async (input) => {
    await reorderModelPhotos({ input });
    await refresh(input.modelId);
    return { modelId: input.modelId };
  },
);

export const updatePhotoAltAction = action(
  { permission: "staff:models" },
  photoAltSchema,
  async (input) => {
    const photo = await updatePhotoAlt({ input });
    await refresh(photo.modelId);
    return photo;
  },
);

export const receiveStockAction = action(
  { permission: "staff:stock" },
  receiveStockSchema,
  async (input, user) => {
    const moved = await receiveStock({ input, actorId: user!.id });
    await refresh(input.modelId);
    return moved;
  },
);

export const adjustStockAction = action(
  { permission: "staff:stock" },
  adjustStockSchema,
  async (input, user) => {
    const moved = await adjustStock({ input, actorId: user!.id });
    await refresh(input.modelId);
    return moved;
  },
);
