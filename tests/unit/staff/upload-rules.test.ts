import { describe, expect, it } from "vitest";
import { parseMediaKey, newPhotoKeyBase, photoObjectKey } from "@/lib/uploads/photo-keys";
import {
  checkFileName,
  checkFileSize,
  chooseDisplayWidths,
  MAX_UPLOAD_BYTES,
} from "@/lib/uploads/upload-rules";
import { photoSrcSet, photoUrl } from "@/lib/catalog/photo-url";

// Common practice, no source: a 10 MB limit (as 10 × 1024 × 1024 bytes), display widths that are
// never enlarged, and server-made keys.

describe("upload limits", () => {
  it("takes a file of exactly 10 MB and refuses one byte more, and an empty one", () => {
    expect(MAX_UPLOAD_BYTES).toBe(10_485_760);
    expect(checkFileSize(MAX_UPLOAD_BYTES)).toEqual({ ok: true });
    const over = checkFileSize(MAX_UPLOAD_BYTES + 1);
    expect(over.ok).toBe(false);
    expect(!over.ok && over.message).toContain("10,485,761 bytes");
    expect(checkFileSize(0)).toEqual({ ok: false, message: "The file is empty." });
  });

  it("refuses file names that climb folders or hide control characters", () => {
    for (const bad of [
      "../../etc/passwd.jpg",
      "..\\boot.ini",
      "photos/../x.png",
      "a\u0000.jpg",
      "..",
      "x..y.jpg",
    ]) {
      expect(checkFileName(bad).ok, bad).toBe(false);
    }
    for (const good of ["front view.jpg", "IMG_2041.JPG", "hollow-four (2).webp", ""])
      expect(checkFileName(good).ok, good).toBe(true);
  });

  it("makes only the display sizes a photo can fill", () => {
    expect(chooseDisplayWidths(4032)).toEqual([320, 640, 960, 1440]);
    expect(chooseDisplayWidths(1440)).toEqual([320, 640, 960, 1440]);
    expect(chooseDisplayWidths(1439)).toEqual([320, 640, 960]);
    expect(chooseDisplayWidths(320)).toEqual([320]);
  });
});

describe("photo keys", () => {
  const uuid = "1b9d6bcd-bbfd-4b2d-9b5d-ab8dfbbd4bed";

  it("are made on the server from a v4 UUID and match what the catalog links to", () => {
    const keyBase = newPhotoKeyBase(() => uuid);
    expect(keyBase).toBe(`photos/${uuid}`);
    expect(newPhotoKeyBase()).toMatch(/^photos\/[0-9a-f-]{36}$/);
    expect(() => newPhotoKeyBase(() => "../../secrets")).toThrow();
    const photo = { keyBase, widths: [320, 640, 960] };
    expect(photoUrl(photo, 480)).toBe(`/media/${photoObjectKey({ keyBase, width: 640 })}`);
    expect(photoSrcSet(photo).split(", ")).toHaveLength(3);
  });

  it("are the only paths the media route serves", () => {
    expect(parseMediaKey(["photos", `${uuid}-640.webp`])).toEqual({
      key: `photos/${uuid}-640.webp`,
      keyBase: `photos/${uuid}`,
      width: 640,
    });
    for (const bad of [
      ["photos", `${uuid}-641.webp`],
      ["photos", `${uuid}-640.png`],
      ["photos", `${uuid}-640.webp`, "x"],
      ["..", "photos", `${uuid}-640.webp`],
      ["photos", "..%2F..%2Fdev-secrets.json"],
      ["other", `${uuid}-640.webp`],
      ["photos", `${uuid.toUpperCase()}-640.webp`],
    ]) {
      expect(parseMediaKey(bad), bad.join("/")).toBeNull();
    }
  });
});
