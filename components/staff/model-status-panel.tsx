"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import {
  publishModelAction,
  retireModelAction,
  returnModelToDraftsAction,
} from "@/lib/staff/actions";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { useToast } from "@/components/ui/toast";
import type { ModelStatus } from "@/lib/staff/status-words";

type Props = { id: string; slug: string; name: string; status: ModelStatus; refusals: string[] };

/** Publish, retire or return to drafts. The server decides; its refusal reasons are shown here. */
export function ModelStatusPanel({ id, slug, name, status, refusals }: Props) {
  const router = useRouter();
  const toast = useToast();
  const [pending, startTransition] = useTransition();
  const [refused, setRefused] = useState<string | null>(null);
  const [confirmRetire, setConfirmRetire] = useState(false);

  const run = (act: typeof publishModelAction, done: string) =>
    startTransition(async () => {
      setRefused(null);
      const result = await act({ id });
      setConfirmRetire(false);
      if (!result.ok) {
        setRefused(result.error.message);
        return;
      }
      toast.notify({ tone: "good", title: done });
      router.refresh();
    });

  return (
    <section
      aria-labelledby="status-title"
      className="rounded-2xl border border-paper-300 bg-paper-50 p-5 shadow-card sm:p-6"
    >
      <h2 id="status-title" className="font-display text-xl font-semibold text-moss-900">
        {status === "published"
          ? "On sale"
          : status === "retired"
            ? "Retired"
            : "Ready to go on sale?"}
      </h2>
      {status === "published" ? (
        <p className="mt-1 text-ink-soft">
          Listed in the{" "}
          <Link href={`/houses/${slug}`} className="font-bold text-moss-800 underline">
            public catalog
          </Link>
          . Retiring takes it off sale; past orders keep it exactly as sold.
        </p>
      ) : status === "retired" ? (
        <p className="mt-1 text-ink-soft">
          Not for sale. Its orders, inspections and stock ledger stay on record.
        </p>
      ) : refusals.length === 0 ? (
        <p className="mt-1 text-ink-soft">
          Every required criterion is met and a built unit passed inspection within 12 months.
        </p>
      ) : (
        <div className="mt-2">
          <p className="text-ink-soft">Before it can go on sale:</p>
          <ul className="mt-1 list-disc pl-5 text-ink" data-testid="publish-blockers">
            {refusals.map((r) => (
              <li key={r}>{r}</li>
            ))}
          </ul>
        </div>
      )}
      <div aria-live="polite" className="empty:hidden">
        {refused ? (
          <Alert tone="poor" title="Not published" className="mt-4">
            {refused}
          </Alert>
        ) : null}
      </div>
      <div className="mt-4 flex flex-wrap gap-2">
        {status !== "published" ? (
          <Button onClick={() => run(publishModelAction, `${name} is on sale.`)} loading={pending}>
            {status === "retired" ? "Put back on sale" : "Publish"}
          </Button>
        ) : (
          <Button variant="secondary" onClick={() => setConfirmRetire(true)} disabled={pending}>
            Retire
          </Button>
        )}
        {status !== "draft" ? (
          <Button
            variant="secondary"
            onClick={() => run(returnModelToDraftsAction, `${name} is back in drafts.`)}
            disabled={pending}
          >
            Return to drafts
          </Button>
        ) : null}
      </div>
      <ConfirmDialog
        open={confirmRetire}
        title={`Retire ${name}?`}
        confirmLabel="Retire"
        pending={pending}
        onCancel={() => setConfirmRetire(false)}
        onConfirm={() => run(retireModelAction, `${name} is retired.`)}
      >
        It leaves the catalog at once. Orders already placed keep it, with the price they paid; you
        can put it back on sale later.
      </ConfirmDialog>
    </section>
  );
}
