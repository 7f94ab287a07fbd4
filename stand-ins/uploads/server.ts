import { mkdirSync } from "node:fs";
import path from "node:path";
// s3rver: a local server speaking the S3 HTTP API, so @aws-sdk/client-s3 runs unchanged.
import S3rver from "s3rver";

export async function startUploadsStandIn({
  port,
  directory,
  bucket,
}: {
  port: number;
  directory: string;
  bucket: string;
}): Promise<{ url: string; close: () => Promise<void> }> {
  const absolute = path.resolve(directory);
  mkdirSync(absolute, { recursive: true });
  const server = new S3rver({
    port,
    address: "127.0.0.1",
    directory: absolute,
    silent: true,
    configureBuckets: [{ name: bucket, configs: [] }],
  });
  await server.run();
  return { url: `http://localhost:${port}`, close: async () => void (await server.close()) };
}
