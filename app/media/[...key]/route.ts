import { NextResponse } from "next/server";
import { getImage, IMMUTABLE_CACHE } from "@/lib/uploads/object-store";
import { parseMediaKey } from "@/lib/uploads/photo-keys";
import { gated, jsonError } from "@/lib/http/route";


// Public: model photos are shown in the catalog. Only keys of the shape the server generates are
// served (photos/<uuid>-<width>.webp), so this route cannot be used to read anything else in the
// bucket. Stored sizes never change, hence the year-long cache.
export const GET = gated(async (
  _request: Request,
  context: { params: Promise<{ key: string[] }> },
): Promise<Response> => {
  const { key: segments } = await context.params;
  const parsed = parseMediaKey(segments);
  if (!parsed)
    return NextResponse.json(
      { error: { code: "not_found", message: "There is no such photo." } },
      { status: 404 },
    );
  try {
    const image = await getImage(parsed.key);
    if (!image)
      return NextResponse.json(
        { error: { code: "not_found", message: "There is no such photo." } },
        { status: 404 },
      );
    const headers = new Headers({
      "content-type": "image/webp",
      "cache-control": IMMUTABLE_CACHE,
      "x-content-type-options": "nosniff",
      "content-security-policy": "default-src 'none'",
    });
    if (image.length !== undefined) headers.set("content-length", String(image.length));
    if (image.etag) headers.set("etag", image.etag);
    return new Response(image.body, { status: 200, headers });
  } catch (error) {
    return jsonError(error);
  }
});
