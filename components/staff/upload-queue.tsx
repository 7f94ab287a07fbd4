"use client";

import { useId } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { ProgressBar } from "@/components/ui/progress-bar";
import { formatMegabytes } from "@/lib/uploads/upload-rules";

export type QueuedFile = {
  key: string;
  file: File;
  altText: string;
  altError?: string;
  state: "ready" | "waiting" | "uploading" | "processing" | "done" | "refused";
  sent: number;
  message?: string;
  /** An object URL, only for files that claim to be JPEG, PNG or WebP: no other file is drawn on the page. */
  previewUrl: string | null;
};

function Preview({ url }: { url: string }) {
  return (
    // eslint-disable-next-line @next/next/no-img-element -- a local preview of a file not yet uploaded
    <img
      src={url}
      alt=""
      className="size-20 shrink-0 rounded-lg border border-paper-300 object-cover"
    />
  );
}

const STATUS_TEXT: Record<QueuedFile["state"], (item: QueuedFile) => string> = {
  ready: () => "Ready to add",
  waiting: () => "Waiting to send",
  uploading: (i) => `${Math.round((i.sent / Math.max(1, i.file.size)) * 100)}% sent`,
  processing: () => "Sent · making display sizes…",
  done: () => "Added",
  refused: () => "Not added",
};

export function UploadRow({
  item,
  onAltText,
  onDiscard,
}: {
  item: QueuedFile;
  onAltText: (value: string) => void;
  onDiscard: () => void;
}) {
  const altId = useId();
  const percent =
    item.state === "done" || item.state === "processing"
      ? 100
      : item.state === "uploading"
        ? (item.sent / Math.max(1, item.file.size)) * 100
        : 0;
  return (
    <li
      className="flex flex-col gap-3 rounded-xl border border-paper-300 bg-paper-50 p-4 sm:flex-row"
      data-testid="upload-row"
    >
      {item.previewUrl && item.state !== "refused" ? <Preview url={item.previewUrl} /> : null}
      <div className="flex min-w-0 flex-1 flex-col gap-3">
        <p className="flex flex-wrap items-baseline justify-between gap-x-3 text-sm">
          <span className="truncate font-bold text-ink">{item.file.name || "Unnamed file"}</span>
          <span className="text-ink-soft">{formatMegabytes(item.file.size)}</span>
        </p>
        {item.state === "ready" ? (
          <Field
            id={`alt-${altId.replace(/:/g, "")}`}
            label={`Description of ${item.file.name || "this photo"}`}
            hint="What the photo shows, for people who cannot see it."
            error={item.altError}
            required
          >
            <Input
              value={item.altText}
              onChange={(e) => onAltText(e.target.value)}
              maxLength={200}
            />
          </Field>
        ) : (
          <ProgressBar
            label={`Upload of ${item.file.name || "photo"}`}
            value={percent}
            valueText={STATUS_TEXT[item.state](item)}
            tone={item.state === "refused" ? "ember" : "moss"}
          />
        )}
        {item.state === "refused" && item.message ? (
          <Alert tone="poor" title="This file was not added">
            {item.message}
          </Alert>
        ) : null}
      </div>
      {item.state === "ready" || item.state === "refused" ? (
        <Button variant="ghost" size="sm" onClick={onDiscard} className="self-start">
          {item.state === "ready" ? "Leave out" : "Dismiss"}
        </Button>
      ) : null}
    </li>
  );
}
