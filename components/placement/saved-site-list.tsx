"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Badge } from "@/components/ui/badge";
import { Button, ButtonLink } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { useToast } from "@/components/ui/toast";
import { isBandId } from "@/lib/climate/band-cookie";
import { clearSavedSite, useSavedSite } from "@/lib/placement/saved-site-store";
import { requestDeleteSite, type ApiError } from "./placement-api";
import { STATUS_WORDS } from "./rule-list";
import type { Rating } from "@/lib/shared/rating";

export type SavedSiteRow = {
  id: string;
  name: string;
  label: Rating;
  bandId: string;
  bandLabel: string;
  savedOn: string;
  orderCount: number;
  /** The skyline's effect on the sun, in plain words (lib/placement/skyline-words.ts). */
  skyline: string;
};

const dateFormat = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeZone: "UTC" });

/** A signed-in buyer's saved sites: open, choose for the next order, or delete (after asking). */
export function SavedSiteList({ sites }: { sites: SavedSiteRow[] }) {
  const router = useRouter();
  const toast = useToast();
  const { site: chosen, save } = useSavedSite();
  const [confirming, setConfirming] = useState<SavedSiteRow | null>(null);
  const [pending, setPending] = useState(false);

  async function onDelete() {
    if (!confirming) return;
    setPending(true);
    try {
      await requestDeleteSite({ id: confirming.id });
      if (chosen?.id === confirming.id) clearSavedSite();
      toast.notify({ tone: "good", title: `“${confirming.name}” is deleted.` });
      setConfirming(null);
      router.refresh();
    } catch (error) {
      toast.notify({
        tone: "poor",
        title: "The site was not deleted.",
        description: (error as ApiError).message,
      });
      setConfirming(null);
    } finally {
      setPending(false);
    }
  }

  return (
    <>
      <ul className="grid gap-4 md:grid-cols-2">
        {sites.map((s) => (
          <li
            key={s.id}
            className="flex flex-col gap-3 rounded-2xl border border-paper-300 bg-paper-50 p-5 shadow-card"
          >
            <div className="flex flex-wrap items-start justify-between gap-2">
              <h2 className="font-display text-xl font-semibold text-moss-900">{s.name}</h2>
              <Badge tone={s.label}>{STATUS_WORDS[s.label]} site</Badge>
            </div>
            <p className="text-sm text-ink-soft">
              {s.bandLabel} · saved {dateFormat.format(new Date(s.savedOn))}
              {s.orderCount > 0
                ? ` · went with ${s.orderCount === 1 ? "an order" : `${s.orderCount} orders`}`
                : ""}
            </p>
            <p className="text-sm">{s.skyline}</p>
            {chosen?.id === s.id ? (
              <p className="text-sm font-bold text-moss-800">Goes with your next order.</p>
            ) : null}
            <div className="mt-auto flex flex-wrap gap-2">
              <ButtonLink
                href={`/placement?site=${s.id}`}
                size="sm"
                variant="secondary"
                aria-label={`Open ${s.name}`}
              >
                Open
              </ButtonLink>
              {chosen?.id !== s.id && isBandId(s.bandId) ? (
                <Button
                  size="sm"
                  variant="ghost"
                  onClick={() => {
                    if (!isBandId(s.bandId)) return;
                    save({ id: s.id, name: s.name, label: s.label, bandId: s.bandId });
                    toast.notify({ tone: "good", title: `“${s.name}” goes with your next order.` });
                  }}
                >
                  Use for my next order
                </Button>
              ) : null}
              {s.orderCount === 0 ? (
                <Button
                  size="sm"
                  variant="ghost"
                  onClick={() => setConfirming(s)}
                  aria-label={`Delete ${s.name}`}
                >
                  Delete
                </Button>
              ) : null}
            </div>
          </li>
        ))}
      </ul>
      <p className="mt-6 text-sm text-ink-soft">
        A site that went with an order is kept for that order&apos;s install guide.{" "}
        <Link href="/houses" className="font-bold text-moss-800 underline">
          Browse the houses
        </Link>
      </p>
      <ConfirmDialog
        open={confirming !== null}
        title={`Delete “${confirming?.name ?? ""}”?`}
        confirmLabel="Delete site"
        pending={pending}
        onConfirm={onDelete}
        onCancel={() => setConfirming(null)}
      >
        The site and its check are removed from your account. This cannot be undone.
      </ConfirmDialog>
    </>
  );
}
