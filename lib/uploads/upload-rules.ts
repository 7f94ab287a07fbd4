// What a staff photo upload may be. Pure: shared by the browser (early, friendly refusals) and the
// server (the refusals that count).

// 10 MB, counted as 10 × 1024 × 1024 bytes: the size browsers and file managers on most staff
// computers print as "10 MB" (common practice, no source). A phone photo is 2–6 MB.
export const MAX_UPLOAD_BYTES = 10 * 1024 * 1024;

/** The only kinds we accept, as sniffed from the bytes (never the name or the declared type). */
export const ACCEPTED_IMAGE_TYPES = ["image/jpeg", "image/png", "image/webp"] as const;
export type AcceptedImageType = (typeof ACCEPTED_IMAGE_TYPES)[number];

/** For the file picker's accept attribute: a hint to the picker, not a check. */
export const ACCEPT_ATTRIBUTE = ".jpg,.jpeg,.png,.webp,image/jpeg,image/png,image/webp";

// Display sizes re-encoded to WebP: a phone column (320/640 at 1x/2x), a card or half page (960),
// and a full-width photo on a large screen (1440). Common practice for responsive srcset steps,
// no source.
export const DISPLAY_WIDTHS = [320, 640, 960, 1440] as const;

// The smallest photo worth listing: it fills the narrowest display size without being enlarged
// (common practice, no source).
export const MIN_WIDTH_PX = 320;
export const MIN_HEIGHT_PX = 240;

// Decoding a 60-megapixel image takes about 240 MB of memory; anything larger is refused before
// decoding, which also stops "decompression bombs" (a tiny file that decodes to a huge image).
export const MAX_INPUT_PIXELS = 60_000_000;

export const MAX_ALT_TEXT = 200;

export function isAcceptedImageType(mime: string | undefined): mime is AcceptedImageType {
  return (ACCEPTED_IMAGE_TYPES as readonly string[]).includes(mime ?? "");
}

/** "9.6 MB" for people (the refusal adds the exact bytes, since 10.0 MB can be just over). */
export function formatMegabytes(bytes: number): string {
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

/** The display sizes a photo of this width gets: never enlarged, so only sizes it can fill. */
export function chooseDisplayWidths(originalWidth: number): number[] {
  return DISPLAY_WIDTHS.filter((w) => w <= originalWidth);
}

export type FileNameCheck = { ok: true } | { ok: false; message: string };

/**
 * The client's file name is never used for storage (keys are generated on the server), but a name
 * that tries to climb folders or hide control characters is a sign of a crafted request, so it is
 * refused outright rather than quietly ignored (common practice, no source: OWASP file-upload
 * guidance says to treat the name as hostile).
 */
export function checkFileName(name: string): FileNameCheck {
  if (name.length === 0) return { ok: true };
  if (name.length > 255)
    return { ok: false, message: "The file name is longer than 255 characters." };
  if (/[\u0000-\u001f\u007f]/.test(name))
    return { ok: false, message: "The file name contains control characters." };
  if (/[/\\]/.test(name) || name === "." || name === ".." || name.includes("..")) {
    return {
      ok: false,
      message: "The file name contains a folder path (like ../); rename the file and try again.",
    };
  }
  return { ok: true };
}

export type SizeCheck = { ok: true } | { ok: false; message: string };

export function checkFileSize(bytes: number): SizeCheck {
  if (bytes === 0) return { ok: false, message: "The file is empty." };
  if (bytes > MAX_UPLOAD_BYTES) {
    return {
      ok: false,
      message: `The file is ${formatMegabytes(bytes)} (${bytes.toLocaleString("en-US")} bytes); photos can be at most 10 MB (${MAX_UPLOAD_BYTES.toLocaleString("en-US")} bytes).`,
    };
  }
  return { ok: true };
}

export const TYPE_REFUSAL =
  "Only JPEG, PNG and WebP photos can be added. This file is not one of them (we check the file's contents, not its name).";
