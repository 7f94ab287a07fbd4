"use client";

import { useState } from "react";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { photoUrl } from "@/lib/catalog/photo-url";
import type { StaffPhoto } from "@/lib/staff/queries/model";
import { altTextSchema } from "@/lib/staff/photo-input";

type Props = {
  photo: StaffPhoto;
  index: number;
  count: number;
  busy: boolean;
  onMove: (direction: -1 | 1) => void;
  onRemove: () => void;
  onSaveAlt: (altText: string) => Promise<string | null>;
};

/** One stored photo: its description, its place in the order, and removal. */
export function PhotoCard({ photo, index, count, busy, onMove, onRemove, onSaveAlt }: Props) {
  const [alt, setAlt] = useState(photo.altText);
  const [error, setError] = useState<string | undefined>();
  const [saving, setSaving] = useState(false);
  const changed = alt.trim() !== photo.altText;
  const label = `Photo ${index + 1} of ${count}`;

  async function save() {
    const parsed = altTextSchema.safeParse(alt);
    if (!parsed.success) return setError(parsed.error.issues[0]?.message);
    setSaving(true);
    const problem = await onSaveAlt(parsed.data);
    setSaving(false);
    setError(problem ?? undefined);
  }

  return (
    <li
      className="flex flex-col overflow-hidden rounded-xl border border-paper-300 bg-paper-50 shadow-card"
      data-testid="photo-card"
    >
      <div className="relative aspect-[4/3] bg-paper-200">
        {/* eslint-disable-next-line @next/next/no-img-element -- served from our own store at fixed sizes */}
        <img
          src={photoUrl(photo, 640)}
          alt={photo.altText}
          className="size-full object-cover"
          loading="lazy"
        />
        {index === 0 ? (
          <span className="absolute top-2 left-2">
            <Badge tone="info">Cover photo</Badge>
          </span>
        ) : null}
      </div>
      <div className="flex flex-1 flex-col gap-3 p-4">
        <p className="text-sm text-ink-soft">
          {label} · {photo.width} × {photo.height} px · {photo.widths.length} display{" "}
          {photo.widths.length === 1 ? "size" : "sizes"}
        </p>
        <Field label="Description" error={error} required>
          <Input value={alt} onChange={(e) => setAlt(e.target.value)} maxLength={200} />
        </Field>
        <div className="mt-auto flex flex-wrap gap-2">
          <Button
            size="sm"
            variant="secondary"
            onClick={save}
            disabled={!changed || busy}
            loading={saving}
          >
            Save description
          </Button>
          <Button
            size="sm"
            variant="ghost"
            onClick={() => onMove(-1)}
            disabled={busy || index === 0}
            aria-label={`Move ${label.toLowerCase()} earlier`}
          >
            ← Earlier
          </Button>
          <Button
            size="sm"
            variant="ghost"
            onClick={() => onMove(1)}
            disabled={busy || index === count - 1}
            aria-label={`Move ${label.toLowerCase()} later`}
          >
            Later →
          </Button>
          <Button
            size="sm"
            variant="ghost"
            onClick={onRemove}
            disabled={busy}
            className="text-berry-700"
            aria-label={`Remove ${label.toLowerCase()}`}
          >
            Remove
          </Button>
        </div>
      </div>
    </li>
  );
}
