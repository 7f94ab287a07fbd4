"use client";

import { useQuery, useQueryClient } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import {
  removePhotoAction,
  reorderPhotosAction,
  updatePhotoAltAction,
} from "@/lib/staff/actions";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { EmptyState } from "@/components/ui/empty-state";
import { useToast } from "@/components/ui/toast";
import type { StaffPhoto } from "@/lib/staff/queries/model";
import { altTextSchema, MAX_PHOTOS_PER_MODEL } from "@/lib/staff/photo-input";
import {
  checkFileName,
  checkFileSize,
  isAcceptedImageType,
  TYPE_REFUSAL,
} from "@/lib/uploads/upload-rules";
import { PhotoCard } from "./photo-card";
import { PhotoDropZone } from "./photo-drop-zone";
import { UploadRow, type QueuedFile } from "./upload-queue";
import { uploadPhoto } from "./upload-photo";
import { withQueries } from "@/components/with-queries";

type Props = { slug: string; modelId: string; modelName: string; initialPhotos: StaffPhoto[] };

// Early refusals in the browser save a wasted upload; the server checks the bytes again either way.
function precheck(file: File): string | null {
  const name = checkFileName(file.name);
  if (!name.ok) return name.message;
  const size = checkFileSize(file.size);
  if (!size.ok) return size.message;
  if (!isAcceptedImageType(file.type)) return TYPE_REFUSAL;
  return null;
}

let nextKey = 0;

function PhotoManagerWithData({ slug, modelId, modelName, initialPhotos }: Props) {
  const router = useRouter();
  const toast = useToast();
  const queryClient = useQueryClient();
  const queryKey = ["staff-photos", slug];
  const { data: photos = initialPhotos } = useQuery({
    queryKey,
    queryFn: async () =>
      (
        await fetchJson<{ items: StaffPhoto[] }>(`/api/staff/models/${encodeURIComponent(slug)}/photos`, {
          fallbackMessage: "The photos could not be loaded.",
        })
      ).items,
    initialData: initialPhotos,
  });
  const [queue, setQueue] = useState<QueuedFile[]>([]);
  const [busy, setBusy] = useState(false);
  const [removing, setRemoving] = useState<StaffPhoto | null>(null);

  const refresh = async () => {
    await queryClient.invalidateQueries({ queryKey });
    router.refresh();
  };
  const update = (key: string, change: Partial<QueuedFile>) =>
    setQueue((q) => q.map((i) => (i.key === key ? { ...i, ...change } : i)));
  // Drops rows from the list and frees their previews.
  const discard = (keep: (item: QueuedFile) => boolean) =>
    setQueue((q) => {
      for (const item of q)
        if (!keep(item) && item.previewUrl) URL.revokeObjectURL(item.previewUrl);
      return q.filter(keep);
    });

  function addFiles(files: FileList | File[]) {
    const items = Array.from(files).map((file): QueuedFile => {
      const problem = precheck(file);
      return {
        key: `f${nextKey++}`,
        file,
        altText: "",
        state: problem ? "refused" : "ready",
        sent: 0,
        message: problem ?? undefined,
        previewUrl: !problem && isAcceptedImageType(file.type) ? URL.createObjectURL(file) : null,
      };
    });
    setQueue((q) => [...q, ...items]);
  }

  const ready = queue.filter((i) => i.state === "ready");
  const room = MAX_PHOTOS_PER_MODEL - photos.length;

  async function uploadReady() {
    let valid = true;
    for (const item of ready) {
      const alt = altTextSchema.safeParse(item.altText);
      update(item.key, { altError: alt.success ? undefined : alt.error.issues[0]?.message });
      if (!alt.success) valid = false;
    }
    if (!valid) return;
    setBusy(true);
    for (const item of ready) update(item.key, { state: "waiting", sent: 0 });
    // One at a time, in the order shown: the first becomes the cover if the model has none, and
    // the server re-encodes one photo at a time instead of several at once.
    for (const item of ready) {
      update(item.key, { state: "uploading", sent: 0 });
      const result = await uploadPhoto({
        slug,
        file: item.file,
        altText: item.altText.trim(),
        onProgress: (sent, total) =>
          update(item.key, sent >= total ? { state: "processing", sent } : { sent }),
      });
      update(
        item.key,
        result.ok ? { state: "done" } : { state: "refused", message: result.message },
      );
    }
    setBusy(false);
    await refresh();
  }

  async function move(index: number, direction: -1 | 1) {
    const order = photos.map((p) => p.id);
    const [moved] = order.splice(index, 1);
    order.splice(index + direction, 0, moved!);
    setBusy(true);
    queryClient.setQueryData<StaffPhoto[]>(
      queryKey,
      order.map((id) => photos.find((p) => p.id === id)!),
    );
    const result = await reorderPhotosAction({ modelId, photoIds: order });
    if (!result.ok)
      toast.notify({
        tone: "poor",
        title: "The order was not saved.",
        description: result.error.message,
      });
    setBusy(false);
    await refresh();
  }

  async function confirmRemove() {
    if (!removing) return;
    setBusy(true);
    const result = await removePhotoAction({ id: removing.id });
    setBusy(false);
    setRemoving(null);
    toast.notify(
      result.ok
        ? { tone: "good", title: "Photo removed." }
        : { tone: "poor", title: "The photo was not removed.", description: result.error.message },
    );
    await refresh();
  }

  async function saveAlt(id: string, altText: string) {
    const result = await updatePhotoAltAction({ id, altText });
    if (!result.ok) return result.error.fields?.altText ?? result.error.message;
    toast.notify({ tone: "good", title: "Description saved." });
    await refresh();
    return null;
  }

  return (
    <div className="flex flex-col gap-8">
      <section aria-labelledby="add-photos" className="flex flex-col gap-4">
        <h2 id="add-photos" className="font-display text-2xl font-semibold text-moss-900">
          Add photos
        </h2>
        <PhotoDropZone room={room} onFiles={addFiles} />

        {queue.length > 0 ? (
          <>
            <ul className="flex flex-col gap-3" aria-label="Photos to add">
              {queue.map((item) => (
                <UploadRow
                  key={item.key}
                  item={item}
                  onAltText={(altText) => update(item.key, { altText, altError: undefined })}
                  onDiscard={() => discard((i) => i.key !== item.key)}
                />
              ))}
            </ul>
            <div className="flex flex-wrap gap-2">
              {ready.length > 0 ? (
                <Button onClick={uploadReady} loading={busy}>
                  {ready.length === 1 ? "Add 1 photo" : `Add ${ready.length} photos`}
                </Button>
              ) : null}
              {queue.some((i) => i.state === "done" || i.state === "refused") && !busy ? (
                <Button variant="ghost" onClick={() => discard((i) => i.state === "ready")}>
                  Clear finished
                </Button>
              ) : null}
            </div>
          </>
        ) : null}
      </section>

      <section aria-labelledby="current-photos" className="flex flex-col gap-4">
        <h2 id="current-photos" className="font-display text-2xl font-semibold text-moss-900">
          Photos of {modelName}
        </h2>
        {photos.length === 0 ? (
          <EmptyState
            level={3}
            title="No photos yet"
            description="Until there are photos, the catalog shows a drawing made from the listed design."
          />
        ) : (
          <>
            <p className="text-sm text-ink-soft">
              The first photo is the cover in the catalog; the rest follow in this order on the
              model&apos;s page.
            </p>
            <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
              {photos.map((photo, index) => (
                <PhotoCard
                  key={photo.id}
                  photo={photo}
                  index={index}
                  count={photos.length}
                  busy={busy}
                  onMove={(direction) => void move(index, direction)}
                  onRemove={() => setRemoving(photo)}
                  onSaveAlt={(alt) => saveAlt(photo.id, alt)}
                />
              ))}
            </ul>
          </>
        )}
      </section>

      <ConfirmDialog
        open={removing !== null}
        title="Remove this photo?"
        confirmLabel="Remove photo"
        pending={busy}
        onCancel={() => setRemoving(null)}
        onConfirm={() => void confirmRemove()}
      >
        {removing
          ? `“${removing.altText}” will be removed from the catalog and deleted from the photo store. This cannot be undone.`
          : null}
      </ConfirmDialog>
    </div>
  );
}

export const PhotoManager = withQueries(PhotoManagerWithData);
