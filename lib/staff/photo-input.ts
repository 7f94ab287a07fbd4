import { z } from "zod";
import { MAX_ALT_TEXT } from "@/lib/uploads/upload-rules";

// Alt text is required: it is what a screen reader says instead of the photo, and what shows
// when the photo cannot load (WCAG 2.2, 1.1.1 Non-text Content).
export const altTextSchema = z
  .string({ error: "Describe the photo for people who cannot see it." })
  .trim()
  .min(
    3,
    "Describe the photo for people who cannot see it, like “Four-chamber house on a pole, seen from below”.",
  )
  .max(MAX_ALT_TEXT, `Keep the description to ${MAX_ALT_TEXT} characters.`)
  .refine(
    (t) => !/\.(jpe?g|png|webp|gif|heic)$/i.test(t),
    "Describe what the photo shows, not its file name.",
  );

export const photoUploadFieldsSchema = z.object({
  altText: altTextSchema,
  fileName: z.string().max(1000, "The file name is too long."),
});

export const photoIdSchema = z.object({ id: z.uuid("Choose a photo.") });
export type PhotoIdInput = z.infer<typeof photoIdSchema>;

export const photoAltSchema = z.object({ id: z.uuid("Choose a photo."), altText: altTextSchema });
export type PhotoAltInput = z.infer<typeof photoAltSchema>;

export const reorderPhotosSchema = z.object({
  modelId: z.uuid("Choose a model."),
  photoIds: z
    .array(z.uuid("Each photo must be one of this model's."))
    .min(1, "List the photos in their new order.")
    .max(40, "A model has at most 40 photos.")
    .refine((ids) => new Set(ids).size === ids.length, "Each photo may appear once."),
});
export type ReorderPhotosInput = z.infer<typeof reorderPhotosSchema>;

// Enough to show a model from every side without turning the page into an album (common
// practice, no source).
export const MAX_PHOTOS_PER_MODEL = 12;
