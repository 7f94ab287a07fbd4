import type { AcceptedImageType } from "./upload-rules";

// Where an image file's own format says it ends. Bytes after that end are how "polyglot" files
// hide a script or page behind a valid picture, so an upload with anything but zero padding
// after the image is refused. Pure: reads the bytes, decodes nothing.
//
// Sources: PNG, W3C "Portable Network Graphics (PNG) Specification (Second Edition)" (2003),
// §5.2–5.3 (signature, chunk layout) and §11.2.5 (IEND is last); JPEG, ITU-T T.81 "Digital
// compression and coding of continuous-tone still images" (1992), Annex B (markers, segment
// lengths, byte stuffing in entropy-coded data); WebP, RFC 9649 "WebP Image Format" (2024), §2.4
// (RIFF header: the file size counts from byte 8).

export type ImageEnd = { ok: true; end: number } | { ok: false; reason: string };

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];

function readUint32BE(bytes: Uint8Array, at: number): number {
  return (
    ((bytes[at]! << 24) >>> 0) + (bytes[at + 1]! << 16) + (bytes[at + 2]! << 8) + bytes[at + 3]!
  );
}

function readUint32LE(bytes: Uint8Array, at: number): number {
  return (
    bytes[at]! + (bytes[at + 1]! << 8) + (bytes[at + 2]! << 16) + ((bytes[at + 3]! << 24) >>> 0)
  );
}

function ascii(bytes: Uint8Array, at: number, length: number): string {
  return String.fromCharCode(...bytes.subarray(at, at + length));
}

export function findPngEnd(bytes: Uint8Array): ImageEnd {
  if (bytes.length < 8 || PNG_SIGNATURE.some((b, i) => bytes[i] !== b))
    return { ok: false, reason: "It does not start like a PNG." };
  let at = 8;
  // Each chunk: 4-byte length, 4-byte type, data, 4-byte CRC.
  while (at + 12 <= bytes.length) {
    const length = readUint32BE(bytes, at);
    const type = ascii(bytes, at + 4, 4);
    const next = at + 12 + length;
    if (next > bytes.length) break;
    if (type === "IEND") return { ok: true, end: next };
    at = next;
  }
  return { ok: false, reason: "The PNG is cut short (it has no end chunk)." };
}

// Markers with no length field after them: TEM, RST0–7, SOI, EOI (T.81, Table B.1).
const isStandalone = (marker: number) => marker === 0x01 || (marker >= 0xd0 && marker <= 0xd9);

export function findJpegEnd(bytes: Uint8Array): ImageEnd {
  if (bytes[0] !== 0xff || bytes[1] !== 0xd8)
    return { ok: false, reason: "It does not start like a JPEG." };
  let at = 2;
  while (at < bytes.length) {
    if (bytes[at] !== 0xff) return { ok: false, reason: "The JPEG's structure is broken." };
    // Any number of 0xFF fill bytes may precede a marker (T.81, B.1.1.2).
    while (bytes[at] === 0xff && at < bytes.length) at++;
    const marker = bytes[at];
    if (marker === undefined) break;
    at++;
    if (marker === 0xd9) return { ok: true, end: at };
    if (isStandalone(marker)) continue;
    if (at + 2 > bytes.length) break;
    const length = (bytes[at]! << 8) + bytes[at + 1]!;
    if (length < 2) return { ok: false, reason: "The JPEG's structure is broken." };
    at += length;
    if (marker === 0xda) {
      // Entropy-coded data follows a scan header: it runs to the next marker that is neither a
      // stuffed 0xFF00 nor a restart marker.
      while (at + 1 < bytes.length) {
        if (bytes[at] === 0xff) {
          const following = bytes[at + 1]!;
          if (following !== 0x00 && !(following >= 0xd0 && following <= 0xd7) && following !== 0xff)
            break;
          if (following === 0xff) {
            at++;
            continue;
          }
        }
        at++;
      }
    }
  }
  return { ok: false, reason: "The JPEG is cut short (it has no end marker)." };
}

export function findWebpEnd(bytes: Uint8Array): ImageEnd {
  if (bytes.length < 12 || ascii(bytes, 0, 4) !== "RIFF" || ascii(bytes, 8, 4) !== "WEBP") {
    return { ok: false, reason: "It does not start like a WebP." };
  }
  const end = 8 + readUint32LE(bytes, 4);
  if (end > bytes.length) return { ok: false, reason: "The WebP is cut short." };
  return { ok: true, end };
}

const FINDERS: Record<AcceptedImageType, (bytes: Uint8Array) => ImageEnd> = {
  "image/png": findPngEnd,
  "image/jpeg": findJpegEnd,
  "image/webp": findWebpEnd,
};

export type StructureCheck = { ok: true } | { ok: false; message: string };

/** Refuses a file whose format ends before its bytes do (zero padding aside) or that is cut short. */
export function checkImageStructure({
  bytes,
  type,
}: {
  bytes: Uint8Array;
  type: AcceptedImageType;
}): StructureCheck {
  const found = FINDERS[type](bytes);
  if (!found.ok) return { ok: false, message: `The file cannot be used: ${found.reason}` };
  const trailing = bytes.subarray(found.end);
  if (trailing.some((b) => b !== 0)) {
    return {
      ok: false,
      message: `The file has ${trailing.length.toLocaleString("en-US")} bytes of other data after the picture ends, so it is refused. If it came straight from a camera or phone, open it in a photo editor, save a copy and add that.`,
    };
  }
  return { ok: true };
}
