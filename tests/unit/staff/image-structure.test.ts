import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import {
  checkImageStructure,
  findJpegEnd,
  findPngEnd,
  findWebpEnd,
} from "@/lib/uploads/image-structure";

// Sources: W3C PNG Specification, 2nd ed. (2003); ITU-T T.81 (1992); RFC 9649 WebP (2024).
// Outside check: real files written by sharp (libvips, libjpeg-turbo, libpng, libwebp) end
// exactly where our reader says they end.

const SCRIPT = new TextEncoder().encode("<script>alert(document.cookie)</script>");
const concat = (a: Uint8Array, b: Uint8Array) => {
  const out = new Uint8Array(a.length + b.length);
  out.set(a);
  out.set(b, a.length);
  return out;
};

let png: Uint8Array;
let jpeg: Uint8Array;
let progressiveJpeg: Uint8Array;
let jpegWithExif: Uint8Array;
let webp: Uint8Array;

beforeAll(async () => {
  // Noise, so the entropy-coded JPEG data holds plenty of 0xFF bytes to be stuffed.
  const noise = Buffer.alloc(64 * 48 * 3);
  for (let i = 0; i < noise.length; i++) noise[i] = (i * 7919) % 256;
  const base = () => sharp(noise, { raw: { width: 64, height: 48, channels: 3 } });
  png = new Uint8Array(await base().png().toBuffer());
  jpeg = new Uint8Array(await base().jpeg({ quality: 95 }).toBuffer());
  progressiveJpeg = new Uint8Array(
    await base().jpeg({ progressive: true, quality: 90 }).toBuffer(),
  );
  jpegWithExif = new Uint8Array(
    await base()
      .jpeg()
      .withExif({ IFD0: { Copyright: "Cedar Hollow" } })
      .toBuffer(),
  );
  webp = new Uint8Array(await base().webp().toBuffer());
});

describe("where an image ends", () => {
  it("finds the true end of files written by a real encoder", () => {
    expect(findPngEnd(png)).toEqual({ ok: true, end: png.length });
    expect(findJpegEnd(jpeg)).toEqual({ ok: true, end: jpeg.length });
    expect(findJpegEnd(progressiveJpeg)).toEqual({ ok: true, end: progressiveJpeg.length });
    expect(findJpegEnd(jpegWithExif)).toEqual({ ok: true, end: jpegWithExif.length });
    expect(findWebpEnd(webp)).toEqual({ ok: true, end: webp.length });
  });

  it("accepts those files and zero padding after them", () => {
    expect(checkImageStructure({ bytes: png, type: "image/png" })).toEqual({ ok: true });
    expect(
      checkImageStructure({ bytes: concat(jpeg, new Uint8Array(16)), type: "image/jpeg" }),
    ).toEqual({ ok: true });
  });

  it("refuses a picture with a script appended (a polyglot), in each format", () => {
    for (const [bytes, type] of [
      [png, "image/png"],
      [jpeg, "image/jpeg"],
      [webp, "image/webp"],
    ] as const) {
      const result = checkImageStructure({ bytes: concat(bytes, SCRIPT), type });
      expect(result.ok, type).toBe(false);
      expect(!result.ok && result.message).toContain(`${SCRIPT.length} bytes of other data`);
    }
  });

  it("refuses a file cut short", () => {
    expect(
      checkImageStructure({ bytes: png.subarray(0, png.length - 12), type: "image/png" }).ok,
    ).toBe(false);
    expect(
      checkImageStructure({ bytes: jpeg.subarray(0, jpeg.length - 2), type: "image/jpeg" }).ok,
    ).toBe(false);
    expect(
      checkImageStructure({ bytes: webp.subarray(0, webp.length - 4), type: "image/webp" }).ok,
    ).toBe(false);
  });
});
