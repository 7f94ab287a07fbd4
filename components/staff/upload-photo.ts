import type { StaffPhoto } from "@/lib/staff/queries/model";
import { errorFromBody } from "@/lib/http/client";

export type UploadResult = { ok: true; photo: StaffPhoto } | { ok: false; message: string };

/**
 * Sends one photo with XMLHttpRequest, whose upload.onprogress reports bytes sent (fetch has no
 * upload progress in browsers yet). Resolves with the stored photo or the server's refusal.
 */
export function uploadPhoto({
  slug,
  file,
  altText,
  onProgress,
}: {
  slug: string;
  file: File;
  altText: string;
  onProgress: (sent: number, total: number) => void;
}): Promise<UploadResult> {
  return new Promise((resolve) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api/staff/models/${encodeURIComponent(slug)}/photos`);
    xhr.responseType = "json";
    xhr.setRequestHeader("accept", "application/json");
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded, event.total);
    };
    xhr.onload = () => {
      const body = xhr.response as { photo?: StaffPhoto } | null;
      if (xhr.status >= 200 && xhr.status < 300 && body?.photo)
        resolve({ ok: true, photo: body.photo });
      else
        resolve({
          ok: false,
          message: errorFromBody(xhr.status, body)?.message ?? `The upload was refused (HTTP ${xhr.status}).`,
        });
    };
    xhr.onerror = () =>
      resolve({
        ok: false,
        message: "The upload was interrupted. Check the connection and try again.",
      });
    xhr.onabort = () => resolve({ ok: false, message: "The upload was cancelled." });
    const form = new FormData();
    form.set("altText", altText);
    form.set("file", file, file.name);
    xhr.send(form);
  });
}
