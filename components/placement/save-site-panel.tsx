"use client";

import Link from "next/link";
import { useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { useToast } from "@/components/ui/toast";
import { siteNameSchema, type SavedSiteReceipt } from "@/lib/placement/saved-site-schema";
import { writeBandChoice } from "@/lib/climate/band-cookie";
import { useSavedSite } from "@/lib/placement/saved-site-store";
import type { PlacementInput } from "@/lib/placement/schema";
import { requestSaveSite, type ApiError } from "./placement-api";

type SaveSitePanelProps = {
  /** The inputs of the answer on screen; null while a newer check is pending. */
  input: PlacementInput | null;
  signedIn: boolean;
  defaultName?: string;
};

/**
 * Saves the checked site (to the account, or for a guest with a token kept beside the cart),
 * makes it the site that goes with the next order, and points the catalog at its band.
 */
export function SaveSitePanel({ input, signedIn, defaultName = "My site" }: SaveSitePanelProps) {
  const toast = useToast();
  const { save } = useSavedSite();
  const [name, setName] = useState(defaultName);
  const [error, setError] = useState<string | undefined>();
  const [busy, setBusy] = useState(false);
  const [saved, setSaved] = useState<SavedSiteReceipt | null>(null);

  async function onSave(event: React.FormEvent) {
    event.preventDefault();
    const parsedName = siteNameSchema.safeParse(name);
    if (!parsedName.success) return setError(parsedName.error.issues[0]?.message);
    if (!input) return;
    setBusy(true);
    setError(undefined);
    try {
      const receipt = await requestSaveSite({ name: parsedName.data, input });
      save({
        id: receipt.id,
        name: receipt.name,
        label: receipt.label,
        bandId: receipt.bandId,
        ...(receipt.guestToken ? { guestToken: receipt.guestToken } : {}),
      });
      // Points the catalog at the site's band, sorted by fit for this site.
      writeBandChoice({
        id: receipt.bandId,
        source: "site",
        valueF: receipt.julyHighF,
        siteName: receipt.name,
        ...(receipt.zip ? { zip: receipt.zip } : {}),
      });
      setSaved(receipt);
      toast.notify({
        tone: "good",
        title: `“${receipt.name}” is saved.`,
        description: "It goes with your next order.",
      });
    } catch (e) {
      const apiError = e as ApiError;
      setError(
        apiError.fields?.name ?? apiError.message ?? "The site was not saved; please try again.",
      );
    } finally {
      setBusy(false);
    }
  }

  return (
    <section
      aria-labelledby="save-site"
      className="flex flex-col gap-4 rounded-2xl border border-moss-200 bg-moss-50 p-5"
    >
      <h2 id="save-site" className="font-display text-xl font-semibold text-moss-900">
        Save this site
      </h2>
      <p className="text-sm text-ink-soft">
        {signedIn
          ? "It is kept in your account. Your next order takes it along, and the install guide is written for it."
          : "It is kept in this browser with your cart. Your next order takes it along, and the install guide is written for it."}
      </p>
      <form onSubmit={onSave} noValidate className="flex flex-wrap items-end gap-3">
        <Field label="Name of the site" error={error} className="min-w-48 flex-1">
          <Input value={name} maxLength={80} onChange={(e) => setName(e.target.value)} />
        </Field>
        <Button type="submit" variant="secondary" loading={busy} disabled={!input}>
          Save site
        </Button>
      </form>
      {!input ? (
        <p className="text-sm text-ink-soft">Wait for the check to finish, then save.</p>
      ) : null}
      <div aria-live="polite">
        {saved ? (
          <Alert tone="good" title={`Saved as “${saved.name}”`}>
            <p>
              The shop now sorts houses by fit for this site.{" "}
              <Link
                href={`/houses?band=${saved.bandId}`}
                className="font-bold underline underline-offset-4"
              >
                See houses that suit this site
              </Link>
              {signedIn ? (
                <>
                  {" · "}
                  <Link href="/account/sites" className="font-bold underline underline-offset-4">
                    Your saved sites
                  </Link>
                </>
              ) : (
                <>
                  {" · "}
                  <Link href="/cart" className="font-bold underline underline-offset-4">
                    Your cart
                  </Link>
                </>
              )}
            </p>
          </Alert>
        ) : null}
      </div>
    </section>
  );
}
