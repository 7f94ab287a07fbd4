import "server-only";
import { and, count, eq, max } from "drizzle-orm";
import { getDb } from "@/db/client";
import { houseModels, modelPhotos } from "@/db/schema";
import { AppError } from "@/lib/http/errors";
import { deleteImages, putImages } from "@/lib/uploads/object-store";
import { newPhotoKeyBase, photoObjectKey } from "@/lib/uploads/photo-keys";
import { prepareImage } from "@/lib/uploads/prepare-image";
import type { StaffPhoto } from "../queries/model";
import { MAX_PHOTOS_PER_MODEL, type PhotoAltInput, type ReorderPhotosInput } from "../photo-input";

const toPhoto = (r: typeof modelPhotos.$inferSelect): StaffPhoto => ({
  id: r.id,
  modelId: r.modelId,
  altText: r.altText,
  keyBase: r.keyBase,
  widths: r.widths,
  width: r.width,
  height: r.height,
  position: r.position,
});

/**
 * Checks, re-encodes and stores one photo, then lists it last. Every refusal happens before the
 * store is touched; if the database write fails, the stored sizes are removed again.
 */
export async function addModelPhoto({
  slug,
  bytes,
  fileName,
  altText,
}: {
  slug: string;
  bytes: Uint8Array;
  fileName: string;
  altText: string;
}): Promise<StaffPhoto> {
  const db = await getDb();
  const [model] = await db
    .select({ id: houseModels.id })
    .from(houseModels)
    .where(eq(houseModels.slug, slug));
  if (!model) throw new AppError("not_found", "There is no house model at that address.");
  const [existing] = await db
    .select({ n: count() })
    .from(modelPhotos)
    .where(eq(modelPhotos.modelId, model.id));
  if ((existing?.n ?? 0) >= MAX_PHOTOS_PER_MODEL) {
    throw new AppError(
      "conflict",
      `A model can have at most ${MAX_PHOTOS_PER_MODEL} photos; remove one first.`,
    );
  }
  const image = await prepareImage({ bytes, fileName });
  const keyBase = newPhotoKeyBase();
  const objects = image.renders.map((r) => ({
    key: photoObjectKey({ keyBase, width: r.width }),
    body: r.body,
  }));
  await putImages(objects);
  try {
    return await db.transaction(async (tx) => {
      const [last] = await tx
        .select({ p: max(modelPhotos.position) })
        .from(modelPhotos)
        .where(eq(modelPhotos.modelId, model.id));
      const [row] = await tx
        .insert(modelPhotos)
        .values({
          modelId: model.id,
          position: (last?.p ?? -1) + 1,
          altText,
          keyBase,
          widths: image.renders.map((r) => r.width),
          width: image.width,
          height: image.height,
        })
        .returning();
      return toPhoto(row!);
    });
  } catch (error) {
    await deleteImages(objects.map((o) => o.key)).catch((e: unknown) =>
      console.error("photo store cleanup:", e),
    );
    throw error;
  }
}

/** Removes the photo's row, then its stored sizes (a leftover file is harmless; a broken row is not). */
export async function removeModelPhoto({ id }: { id: string }): Promise<{ modelId: string }> {
  const db = await getDb();
  const [row] = await db.delete(modelPhotos).where(eq(modelPhotos.id, id)).returning();
  if (!row) throw new AppError("not_found", "That photo was already removed.");
  await deleteImages(
    row.widths.map((width) => photoObjectKey({ keyBase: row.keyBase, width })),
  ).catch((e: unknown) => console.error("photo store cleanup:", e));
  return { modelId: row.modelId };
}

/** Sets the order of a model's photos; the list must name each of its photos exactly once. */
export async function reorderModelPhotos({ input }: { input: ReorderPhotosInput }): Promise<void> {
  const db = await getDb();
  await db.transaction(async (tx) => {
    const rows = await tx
      .select({ id: modelPhotos.id })
      .from(modelPhotos)
      .where(eq(modelPhotos.modelId, input.modelId));
    const current = new Set(rows.map((r) => r.id));
    if (current.size !== input.photoIds.length || input.photoIds.some((id) => !current.has(id))) {
      throw new AppError(
        "conflict",
        "The photos changed while you were reordering them. Reload the page and try again.",
      );
    }
    for (const [position, id] of input.photoIds.entries()) {
      await tx
        .update(modelPhotos)
        .set({ position })
        .where(and(eq(modelPhotos.id, id), eq(modelPhotos.modelId, input.modelId)));
    }
  });
}

export async function updatePhotoAlt({ input }: { input: PhotoAltInput }): Promise<StaffPhoto> {
  const db = await getDb();
  const [row] = await db
    .update(modelPhotos)
    .set({ altText: input.altText })
    .where(eq(modelPhotos.id, input.id))
    .returning();
  if (!row) throw new AppError("not_found", "That photo was removed.");
  return toPhoto(row);
}
