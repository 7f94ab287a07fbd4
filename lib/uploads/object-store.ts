import "server-only";
import {
  DeleteObjectsCommand,
  GetObjectCommand,
  NoSuchKey,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from "@aws-sdk/client-s3";
import { env } from "@/lib/config/env";
import { AppError } from "@/lib/http/errors";

// The photo store: any S3-compatible service, chosen by configuration (S3_ENDPOINT, S3_BUCKET,
// keys and region); locally the s3rver stand-in that scripts/start.ts runs.

export type ObjectStoreSettings = {
  endpoint: string | undefined;
  bucket: string;
  region: string;
  accessKeyId: string;
  secretAccessKey: string;
};

type Store = { client: S3Client; bucket: string };

// One client per process (it pools connections), kept on globalThis so hot reloads reuse it.
const globalForStore = globalThis as unknown as { __roostwrightObjectStore?: Store };

function createStore(settings: ObjectStoreSettings): Store {
  const client = new S3Client({
    endpoint: settings.endpoint,
    region: settings.region,
    credentials: { accessKeyId: settings.accessKeyId, secretAccessKey: settings.secretAccessKey },
    // Bucket in the path (http://host/bucket/key): the local stand-in and most self-hosted
    // S3-compatible stores have no per-bucket host names.
    forcePathStyle: true,
    maxAttempts: 2,
  });
  return { client, bucket: settings.bucket };
}

function store(): Store {
  if (!globalForStore.__roostwrightObjectStore) {
    const e = env();
    globalForStore.__roostwrightObjectStore = createStore({
      endpoint: e.S3_ENDPOINT,
      bucket: e.S3_BUCKET,
      region: e.S3_REGION,
      accessKeyId: e.S3_ACCESS_KEY_ID,
      secretAccessKey: e.S3_SECRET_ACCESS_KEY,
    });
  }
  return globalForStore.__roostwrightObjectStore;
}

/** Points this process at another store: tests start their own stand-in on a free port. */
export function configureObjectStore(settings: ObjectStoreSettings): void {
  globalForStore.__roostwrightObjectStore = createStore(settings);
}

// Stored sizes never change (a new photo gets a new key), so they may be cached for a year.
export const IMMUTABLE_CACHE = "public, max-age=31536000, immutable";

function unavailable(error: unknown): AppError {
  console.error("photo store:", error);
  return new AppError(
    "unavailable",
    "The photo store is not answering right now. Please try again in a minute.",
  );
}

export async function putImages(objects: { key: string; body: Uint8Array }[]): Promise<void> {
  const { client, bucket } = store();
  const written: string[] = [];
  try {
    for (const o of objects) {
      await client.send(
        new PutObjectCommand({
          Bucket: bucket,
          Key: o.key,
          Body: o.body,
          ContentType: "image/webp",
          CacheControl: IMMUTABLE_CACHE,
        }),
      );
      written.push(o.key);
    }
  } catch (error) {
    // All sizes or none: a half-stored photo would break its srcset.
    await deleteImages(written).catch(() => undefined);
    throw unavailable(error);
  }
}

export async function deleteImages(keys: string[]): Promise<void> {
  if (keys.length === 0) return;
  const { client, bucket } = store();
  await client.send(
    new DeleteObjectsCommand({
      Bucket: bucket,
      Delete: { Objects: keys.map((Key) => ({ Key })), Quiet: true },
    }),
  );
}

export type StoredImage = {
  body: ReadableStream<Uint8Array>;
  length: number | undefined;
  etag: string | undefined;
};

/** One stored image as a stream, or null when there is no such key. */
export async function getImage(key: string): Promise<StoredImage | null> {
  const { client, bucket } = store();
  try {
    const out = await client.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
    if (!out.Body) return null;
    return {
      body: out.Body.transformToWebStream() as ReadableStream<Uint8Array>,
      length: out.ContentLength,
      etag: out.ETag,
    };
  } catch (error) {
    if (error instanceof NoSuchKey) return null;
    if (error instanceof S3ServiceException && error.$metadata.httpStatusCode === 404) return null;
    throw unavailable(error);
  }
}
