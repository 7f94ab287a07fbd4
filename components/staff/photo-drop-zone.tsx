"use client";

import { useState, type DragEvent } from "react";
import { getButtonClasses } from "@/components/ui/button";
import { cn } from "@/components/ui/cn";
import { MAX_PHOTOS_PER_MODEL } from "@/lib/staff/photo-input";
import { ACCEPT_ATTRIBUTE } from "@/lib/uploads/upload-rules";

/** Drag-and-drop, with the file picker as the keyboard and phone way in. */
export function PhotoDropZone({
  room,
  onFiles,
}: {
  room: number;
  onFiles: (files: FileList) => void;
}) {
  const [dragging, setDragging] = useState(false);
  const onDrop = (event: DragEvent<HTMLDivElement>) => {
    event.preventDefault();
    setDragging(false);
    if (event.dataTransfer.files.length > 0) onFiles(event.dataTransfer.files);
  };
  return (
    <div
      onDragOver={(e) => {
        e.preventDefault();
        setDragging(true);
      }}
      onDragLeave={() => setDragging(false)}
      onDrop={onDrop}
      className={cn(
        "flex flex-col items-center gap-3 rounded-2xl border-2 border-dashed px-6 py-10 text-center transition-colors",
        dragging ? "border-moss-600 bg-moss-50" : "border-bark-300 bg-paper-50",
      )}
      data-testid="drop-zone"
    >
      <p className="font-display text-lg font-semibold text-moss-900">Drop photos here</p>
      <p className="max-w-md text-sm text-ink-soft">
        JPEG, PNG or WebP, up to 10 MB each and at least 320 × 240 px. We make web sizes and remove
        camera data (such as location) from every photo.
      </p>
      <label
        className={cn(
          getButtonClasses({ variant: "secondary" }),
          "cursor-pointer focus-within:outline-3 focus-within:outline-offset-2 focus-within:outline-dusk-500",
        )}
      >
        <input
          type="file"
          multiple
          accept={ACCEPT_ATTRIBUTE}
          className="sr-only"
          onChange={(e) => {
            if (e.target.files) onFiles(e.target.files);
            e.target.value = "";
          }}
        />
        Choose photos
      </label>
      <p className="text-xs text-ink-soft">
        {room > 0
          ? `Room for ${room} more (at most ${MAX_PHOTOS_PER_MODEL} per model).`
          : `This model has the most photos it can have (${MAX_PHOTOS_PER_MODEL}).`}
      </p>
    </div>
  );
}
