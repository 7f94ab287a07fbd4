import { expireModel } from "@/lib/catalog/expire";
import { AppError, badInput } from "@/lib/http/errors";
import { gateValue } from "@/lib/http/input-gate";
import { route } from "@/lib/http/route";
import { getStaffModelBySlug, listModelPhotos } from "@/lib/staff/queries/model";
import { photoUploadFieldsSchema } from "@/lib/staff/photo-input";
import { addModelPhoto } from "@/lib/staff/commands/photos";
import { readLimitedBody } from "@/lib/uploads/read-limited-body";
import { MAX_UPLOAD_BYTES } from "@/lib/uploads/upload-rules";


// Room for the multipart boundaries, the alt text and the file name around a file at the limit;
// the file itself is measured exactly after parsing.
const MULTIPART_SLACK_BYTES = 64 * 1024;

export const GET = route<{ slug: string }>({ permission: "staff:models" }, async ({ params }) => {
  const model = await getStaffModelBySlug({ slug: params.slug });
  if (!model) throw new AppError("not_found", "There is no house model at that address.");
  return { items: await listModelPhotos({ modelId: model.row.id }) };
});

/** One photo per request (multipart: `file` and `altText`), so each file has its own progress. */
export const POST = route<{ slug: string }>(
  { permission: "staff:models" },
  async ({ request, params }) => {
    const contentType = request.headers.get("content-type") ?? "";
    if (!contentType.toLowerCase().startsWith("multipart/form-data")) {
      throw new AppError(
        "bad_request",
        "Send the photo as multipart/form-data with a file and its alt text.",
      );
    }
    const body = await readLimitedBody({
      request,
      maxBytes: MAX_UPLOAD_BYTES + MULTIPART_SLACK_BYTES,
    });
    let form: FormData;
    try {
      form = await new Response(body as BodyInit, {
        headers: { "content-type": contentType },
      }).formData();
    } catch {
      throw new AppError(
        "bad_request",
        "The upload could not be read as a form. Please try again.",
      );
    }
    gateValue(form);
    const file = form.get("file");
    if (!(file instanceof Blob))
      throw new AppError("bad_request", "Choose a photo to add.", {
        file: "Choose a photo to add.",
      });
    const fields = photoUploadFieldsSchema.safeParse({
      altText: form.get("altText") ?? undefined,
      fileName: file instanceof File ? file.name : "",
    });
    if (!fields.success) throw badInput(fields.error);
    const photo = await addModelPhoto({
      slug: params.slug,
      bytes: new Uint8Array(await file.arrayBuffer()),
      fileName: fields.data.fileName,
      altText: fields.data.altText,
    });
    await expireModel(photo.modelId, "details", "route");
    return Response.json({ photo }, { status: 201 });
  },
);
