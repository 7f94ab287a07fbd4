import { mkdtempSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import path from "node:path";
import { DeleteObjectsCommand, ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import type { Db } from "@/db/client";
import { houseModels, users } from "@/db/schema";
import type { Role } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session";
import { startUploadsStandIn } from "@/stand-ins/uploads/server";
import { configureObjectStore } from "@/lib/uploads/object-store";

export const BUCKET = "roostwright-photos-test";

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      const port = typeof address === "object" && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

/** The uploads stand-in on a free port and a temp folder, with the app's store pointed at it. */
export async function startPhotoStore() {
  const directory = mkdtempSync(path.join(tmpdir(), "roostwright-photos-"));
  const port = await freePort();
  const standIn = await startUploadsStandIn({ port, directory, bucket: BUCKET });
  const settings = {
    endpoint: standIn.url,
    bucket: BUCKET,
    region: "us-east-1",
    accessKeyId: "S3RVER",
    secretAccessKey: "S3RVER",
  };
  configureObjectStore(settings);
  const client = new S3Client({
    endpoint: settings.endpoint,
    region: settings.region,
    credentials: { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" },
    forcePathStyle: true,
  });
  return {
    url: standIn.url,
    /** Every key in the bucket: proof that a refused upload stored nothing. */
    async listKeys(): Promise<string[]> {
      const out = await client.send(new ListObjectsV2Command({ Bucket: BUCKET }));
      return (out.Contents ?? []).map((o) => o.Key!).sort();
    },
    /** Empties the bucket between tests (the database is truncated; the store must match). */
    async clear() {
      const keys = await this.listKeys();
      if (keys.length > 0) {
        await client.send(
          new DeleteObjectsCommand({
            Bucket: BUCKET,
            Delete: { Objects: keys.map((Key) => ({ Key })) },
          }),
        );
      }
    },
    async close() {
      client.destroy();
      await standIn.close();
      rmSync(directory, { recursive: true, force: true });
    },
  };
}

/** The demo account of a role, as the mocked session returns it. */
export async function sessionUserFor(db: Db, role: Role): Promise<SessionUser> {
  const [u] = await db.select().from(users).where(eq(users.role, role)).limit(1);
  if (!u) throw new Error(`no demo user with role ${role}`);
  return { id: u.id, name: u.name, email: u.email, role: u.role };
}

export async function modelBySlug(db: Db, slug: string) {
  const [m] = await db.select().from(houseModels).where(eq(houseModels.slug, slug));
  if (!m) throw new Error(`no model ${slug}`);
  return m;
}

/** A photo-like picture: smooth gradients with some noise, like wood grain under daylight. */
export async function makePhoto({
  width,
  height,
  format,
}: {
  width: number;
  height: number;
  format: "jpeg" | "png" | "webp";
}): Promise<Uint8Array> {
  const raw = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const i = (y * width + x) * 3;
      raw[i] = (120 + ((x * 3) % 90)) & 255;
      raw[i + 1] = (80 + ((y * 2) % 60)) & 255;
      raw[i + 2] = (40 + ((x * y) % 50)) & 255;
    }
  }
  const image = sharp(raw, { raw: { width, height, channels: 3 } });
  const out =
    format === "jpeg"
      ? image
          .jpeg({ quality: 85 })
          .withExif({ IFD0: { Artist: "Workshop camera", Copyright: "Cedar Hollow" } })
      : format === "png"
        ? image.png()
        : image.webp();
  return new Uint8Array(await out.toBuffer());
}

export function uploadRequest({
  slug,
  bytes,
  fileName,
  type,
  altText = "Four-chamber house seen from the front",
}: {
  slug: string;
  bytes: Uint8Array;
  fileName: string;
  type: string;
  altText?: string;
}): Request {
  const form = new FormData();
  form.set("altText", altText);
  form.set("file", new File([bytes as BlobPart], fileName, { type }));
  return new Request(`http://localhost/api/staff/models/${slug}/photos`, {
    method: "POST",
    body: form,
  });
}

export const params = <P extends object>(p: P) => ({ params: Promise.resolve(p) });

export type { Role };
