import "server-only";
import { fileTypeFromBuffer } from "file-type";
import sharp, { type Metadata } from "sharp";
import { AppError } from "@/lib/http/errors";
import { checkImageStructure } from "./image-structure";
import {
  MAX_INPUT_PIXELS,
  MIN_HEIGHT_PX,
  MIN_WIDTH_PX,
  TYPE_REFUSAL,
  checkFileName,
  checkFileSize,
  chooseDisplayWidths,
  isAcceptedImageType,
  type AcceptedImageType,
} from "./upload-rules";

export type PreparedImage = {
  type: AcceptedImageType;
  /** Size of the largest stored rendering, after turning it upright. */
  width: number;
  height: number;
  renders: { width: number; body: Buffer }[];
};

// WebP quality 80: visually clean for photos of wood at a third of JPEG's size (sharp's own
// default; common practice, no source).
const WEBP_QUALITY = 80;

/**
 * Every check an uploaded photo must pass, cheapest first, then the re-encode. Throws a 400
 * AppError with a message staff can act on; nothing is stored until all of it succeeds.
 */
export async function prepareImage({
  bytes,
  fileName,
}: {
  bytes: Uint8Array;
  fileName: string;
}): Promise<PreparedImage> {
  const name = checkFileName(fileName);
  if (!name.ok) throw new AppError("bad_request", name.message, { file: name.message });
  const size = checkFileSize(bytes.byteLength);
  if (!size.ok) throw new AppError("bad_request", size.message, { file: size.message });

  // The type comes from the file's first bytes (file-type), never from its name or declared type.
  const sniffed = await fileTypeFromBuffer(bytes);
  if (!isAcceptedImageType(sniffed?.mime))
    throw new AppError("bad_request", TYPE_REFUSAL, { file: TYPE_REFUSAL });
  const type = sniffed.mime as AcceptedImageType;
  const structure = checkImageStructure({ bytes, type });
  if (!structure.ok)
    throw new AppError("bad_request", structure.message, { file: structure.message });

  const unreadable =
    "The photo could not be read; it may be damaged. Try saving it again and adding the copy.";
  let meta: Metadata;
  try {
    meta = await sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS }).metadata();
  } catch {
    throw new AppError("bad_request", unreadable, { file: unreadable });
  }
  // EXIF orientations 5–8 are stored sideways; the upright width is the stored height.
  const sideways = (meta.orientation ?? 1) >= 5;
  const uprightWidth = (sideways ? meta.height : meta.width) ?? 0;
  const uprightHeight = (sideways ? meta.width : meta.height) ?? 0;
  if (uprightWidth * uprightHeight > MAX_INPUT_PIXELS) {
    const m = `The photo is ${uprightWidth} × ${uprightHeight} pixels; we take at most ${MAX_INPUT_PIXELS / 1_000_000} megapixels.`;
    throw new AppError("bad_request", m, { file: m });
  }
  if (uprightWidth < MIN_WIDTH_PX || uprightHeight < MIN_HEIGHT_PX) {
    const m = `The photo is ${uprightWidth} × ${uprightHeight} pixels; it needs to be at least ${MIN_WIDTH_PX} × ${MIN_HEIGHT_PX} to look sharp.`;
    throw new AppError("bad_request", m, { file: m });
  }

  try {
    const renders: PreparedImage["renders"] = [];
    let largest = { width: 0, height: 0 };
    for (const width of chooseDisplayWidths(uprightWidth)) {
      // A fresh pipeline per size; sharp drops EXIF, GPS, XMP and ICC text by default (we never
      // call keepMetadata), and autoOrient turns the pixels upright before the tag is dropped.
      const { data, info } = await sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS })
        .autoOrient()
        .resize({ width, withoutEnlargement: true })
        .webp({ quality: WEBP_QUALITY })
        .toBuffer({ resolveWithObject: true });
      renders.push({ width, body: data });
      if (info.width >= largest.width) largest = { width: info.width, height: info.height };
    }
    return { type, width: largest.width, height: largest.height, renders };
  } catch {
    throw new AppError("bad_request", unreadable, { file: unreadable });
  }
}
