import { AppError } from "@/lib/http/errors";
import { route } from "@/lib/http/route";
import { parseReportPhotoKey } from "@/lib/roost-reports/photo-keys";
import { getImage } from "@/lib/uploads/object-store";


// Buyers' report photos may show their house or yard: staff and admin only, never cached by a
// shared cache, and only keys of the shape the server makes.
export const GET = route<{ key: string[] }>({ permission: "staff:roost-reports" }, async ({ params }) => {
  const parsed = parseReportPhotoKey(params.key);
  if (!parsed) throw new AppError("not_found", "There is no such photo.");
  const image = await getImage(parsed.key);
  if (!image) throw new AppError("not_found", "There is no such photo.");
  const headers = new Headers({
    "content-type": "image/webp",
    "cache-control": "private, max-age=3600",
    "x-content-type-options": "nosniff",
    "content-security-policy": "default-src 'none'",
  });
  if (image.length !== undefined) headers.set("content-length", String(image.length));
  return new Response(image.body, { headers });
});
