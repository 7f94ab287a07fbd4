"use server";

import { revalidatePath } from "next/cache";
import { action } from "@/lib/http/action";
import { photoAltSchema, photoIdSchema, reorderPhotosSchema } from "@/lib/staff/photo-input";
import { removeModelPhoto, reorderModelPhotos, updatePhotoAlt } from "@/lib/staff/photos";

// Uploads go through the JSON route (app/api/staff/models/[slug]/photos) for per-file progress;
// the rest are small changes made here.

function refresh() {
  revalidatePath("/staff", "layout");
  revalidatePath("/houses", "layout");
}

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
