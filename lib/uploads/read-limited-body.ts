import { AppError } from "@/lib/http/errors";

/**
 * Reads a request body but stops at `maxBytes`, so an oversized upload is refused without
 * holding all of it in memory (request.formData() would read any size).
 */
export async function readLimitedBody({
  request,
  maxBytes,
}: {
  request: Request;
  maxBytes: number;
}): Promise<Uint8Array> {
  const tooLarge = () =>
    new AppError(
      "bad_request",
      `The upload is larger than the ${Math.floor(maxBytes / (1024 * 1024))} MB limit.`,
    );
  const declared = Number(request.headers.get("content-length") ?? "NaN");
  if (Number.isFinite(declared) && declared > maxBytes) throw tooLarge();
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge();
    }
    chunks.push(value);
  }
  const body = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    body.set(c, at);
    at += c.byteLength;
  }
  return body;
}
