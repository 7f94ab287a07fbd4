import { DISPLAY_WIDTHS } from "./upload-rules";

// Storage keys are made here, on the server, from a random UUID: never from the client's file
// name, so no upload can choose or guess where it lands, overwrite another photo, or climb out of
// the photos folder. The media route serves only keys of exactly this shape.

const UUID_V4 = "[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}";
const KEY_BASE_PATTERN = new RegExp(`^photos/${UUID_V4}$`);
const OBJECT_KEY_PATTERN = new RegExp(`^(photos/${UUID_V4})-(\\d{3,4})\\.webp$`);

/** A fresh key base, e.g. "photos/1b9d6bcd-bbfd-4b2d-9b5d-ab8dfbbd4bed". */
export function newPhotoKeyBase(randomUuid: () => string = () => crypto.randomUUID()): string {
  const keyBase = `photos/${randomUuid()}`;
  if (!KEY_BASE_PATTERN.test(keyBase)) throw new Error("The generated photo key is not a v4 UUID.");
  return keyBase;
}

/** The key of one display size; the same shape photoUrl() in lib/catalog/photo-url.ts links to. */
export function photoObjectKey({ keyBase, width }: { keyBase: string; width: number }): string {
  return `${keyBase}-${width}.webp`;
}

/** The stored key for a /media/… path, or null when the path is not one we could have made. */
export function parseMediaKey(
  segments: readonly string[],
): { key: string; keyBase: string; width: number } | null {
  if (segments.length !== 2 || segments[0] !== "photos") return null;
  const key = segments.join("/");
  const match = OBJECT_KEY_PATTERN.exec(key);
  if (!match) return null;
  const width = Number(match[2]);
  if (!(DISPLAY_WIDTHS as readonly number[]).includes(width)) return null;
  return { key, keyBase: match[1]!, width };
}
