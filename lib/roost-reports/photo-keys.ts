import { DISPLAY_WIDTHS } from "@/lib/uploads/upload-rules";

// Buyers' report photos live apart from the catalog's photos: they may show a buyer's house or
// yard, so they are never served by the public media route (which serves photos/… only), only
// by the staff route that checks the role. Keys are made on the server from a random UUID.

const UUID_V4 = "[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}";
const OBJECT_KEY = new RegExp(`^(roost-photos/${UUID_V4})-(\\d{3,4})\\.webp$`);

export function newReportPhotoKeyBase(randomUuid: () => string = () => crypto.randomUUID()): string {
  const keyBase = `roost-photos/${randomUuid()}`;
  if (!new RegExp(`^roost-photos/${UUID_V4}$`).test(keyBase)) throw new Error("The generated key is not a v4 UUID.");
  return keyBase;
}

/** The stored key for a staff photo path, or null when it is not one we could have made. */
export function parseReportPhotoKey(segments: readonly string[]): { key: string; width: number } | null {
  if (segments.length !== 2 || segments[0] !== "roost-photos") return null;
  const key = segments.join("/");
  const match = OBJECT_KEY.exec(key);
  if (!match) return null;
  const width = Number(match[2]);
  if (!(DISPLAY_WIDTHS as readonly number[]).includes(width)) return null;
  return { key, width };
}

/** Where staff pages load a report photo from (the staff-only route). */
export function reportPhotoUrl({ keyBase, widths }: { keyBase: string; widths: number[] }, want: number): string {
  const width = widths.filter((w) => w <= want).at(-1) ?? widths[0] ?? want;
  return `/api/staff/roost-reports/photos/${keyBase}-${width}.webp`;
}
