import { getSessionUser } from "@/lib/auth/session";
import { expireOccupancy } from "@/lib/catalog/expire";
import { AppError, badInput } from "@/lib/http/errors";
import { gateValue } from "@/lib/http/input-gate";
import { route } from "@/lib/http/route";
import { reportFromOrderPage } from "@/lib/roost-reports/order-reports";
import { houseReportSchema } from "@/lib/roost-reports/report-input";
import { readLimitedBody } from "@/lib/uploads/read-limited-body";
import { MAX_UPLOAD_BYTES } from "@/lib/uploads/upload-rules";

// Room for the boundaries and the text fields around a photo at the limit; the photo itself is
// measured exactly afterwards (lib/uploads).
const MULTIPART_SLACK_BYTES = 64 * 1024;

/**
 * A buyer's report on one house: multipart with orderLineId, unit, season, answer, countBand,
 * note, mount, an optional photo and, for a guest, `t` (the order's private link token).
 */
export const POST = route<{ id: string }>({ public: true }, async ({ request, params }) => {
  const contentType = request.headers.get("content-type") ?? "";
  if (!contentType.toLowerCase().startsWith("multipart/form-data"))
    throw new AppError("bad_request", "Send the report as multipart/form-data.");
  const body = await readLimitedBody({ request, maxBytes: MAX_UPLOAD_BYTES + MULTIPART_SLACK_BYTES });
  let form: FormData;
  try {
    form = await new Response(body as BodyInit, { headers: { "content-type": contentType } }).formData();
  } catch {
    throw new AppError("bad_request", "The report could not be read as a form. Please try again.");
  }
  gateValue(form);
  const text = (name: string) => {
    const value = form.get(name);
    return typeof value === "string" ? value : undefined;
  };
  const parsed = houseReportSchema.safeParse({
    orderLineId: text("orderLineId"),
    unit: text("unit"),
    season: text("season"),
    answer: text("answer"),
    countBand: text("countBand"),
    note: text("note"),
    mount: text("mount"),
  });
  if (!parsed.success) throw badInput(parsed.error);
  const file = form.get("photo");
  const photo =
    file instanceof Blob && file.size > 0
      ? { bytes: new Uint8Array(await file.arrayBuffer()), fileName: file instanceof File ? file.name : "" }
      : undefined;
  const result = await reportFromOrderPage({
    orderId: params.id,
    accessToken: text("t") ?? null,
    user: await getSessionUser(),
    input: parsed.data,
    photo,
  });
  expireOccupancy("route");
  return Response.json(result, { status: result.outcome === "recorded" ? 201 : 200 });
});
