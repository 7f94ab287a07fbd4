"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useEffect, useState } from "react";
import { Controller, FormProvider, useForm, useWatch } from "react-hook-form";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Spinner } from "@/components/ui/spinner";
import { readSavedSite } from "@/lib/placement/saved-site-store";
import { placementInputSchema, type PlacementInput } from "@/lib/placement/schema";
import { FacingField } from "./facing-field";
import { PLANNER_DEFAULTS, type PlacementFormValues } from "./form-values";
import { LocationFields, type LocateBy } from "./location-fields";
import { requestSavedSite } from "./placement-api";
import { PlacementCautions } from "./placement-cautions";
import { PlacementResult } from "./placement-result";
import { SaveSitePanel } from "./save-site-panel";
import { SiteFields } from "./site-fields";
import { SkylineFields } from "./skyline-fields";
import { usePlacementCheck } from "./use-placement-check";
import { withQueries } from "@/components/with-queries";

type PlacementPlannerProps = {
  signedIn: boolean;
  /** Opens a saved site (`/placement?site=…`): the owner's, or a guest's with the token kept here. */
  siteId?: string;
};

/** The site check: the form on one side, the live answer on the other (stacked on phones). */
function PlacementPlannerWithData({ signedIn, siteId }: PlacementPlannerProps) {
  const form = useForm<PlacementFormValues, unknown, PlacementInput>({
    resolver: zodResolver(placementInputSchema),
    defaultValues: PLANNER_DEFAULTS,
    // Hidden fields (the other way of giving the place, an unticked July high) drop out.
    shouldUnregister: true,
  });
  const [locateBy, setLocateBy] = useState<LocateBy>("zip");
  const [knowsJulyHigh, setKnowsJulyHigh] = useState(false);
  const [describesSkyline, setDescribesSkyline] = useState(false);
  const [loaded, setLoaded] = useState<{ name: string } | null>(null);
  const [loadError, setLoadError] = useState<string | null>(null);

  const values = useWatch({ control: form.control });
  const parsed = placementInputSchema.safeParse(values);
  const input = parsed.success ? parsed.data : null;
  const { query, busy, current, checkNow } = usePlacementCheck(input);
  const serverErrors = query.error?.fields ?? {};
  const answer = query.data;

  // A July high the check needs (no station near, or none loaded): open the field for it, and
  // keep it open once typed in (adjusted while rendering, React's pattern for derived state).
  const needsJulyHigh = Boolean(serverErrors.julyHighF);
  if (needsJulyHigh && !knowsJulyHigh) setKnowsJulyHigh(true);

  useEffect(() => {
    if (!siteId) return;
    const stored = readSavedSite();
    requestSavedSite({
      id: siteId,
      guestToken: stored?.id === siteId ? stored.guestToken : undefined,
    })
      .then((site) => {
        setLocateBy(site.input.lat !== undefined ? "coordinates" : "zip");
        setKnowsJulyHigh(site.input.julyHighF !== undefined || site.input.julyHighC !== undefined);
        setDescribesSkyline(Array.isArray(site.input.skyline));
        form.reset({ ...PLANNER_DEFAULTS, ...site.input });
        setLoaded({ name: site.name });
      })
      .catch(() =>
        setLoadError(
          "We could not open that saved site. It may have been deleted, or saved in another browser.",
        ),
      );
  }, [siteId, form]);

  const lat = answer?.location.lat ?? (typeof values.lat === "number" ? values.lat : undefined);

  return (
    <FormProvider {...form}>
      <div className="grid gap-10 lg:grid-cols-[minmax(0,25rem)_minmax(0,1fr)] lg:items-start">
        <form
          onSubmit={form.handleSubmit(checkNow)}
          noValidate
          aria-label="Describe your site"
          className="flex flex-col gap-8"
        >
          {loadError ? (
            <Alert tone="warn" title="Saved site not found">
              {loadError}
            </Alert>
          ) : null}
          {loaded ? (
            <p className="font-bold text-moss-800">Editing your saved site “{loaded.name}”.</p>
          ) : null}
          <LocationFields
            locateBy={locateBy}
            onLocateByChange={setLocateBy}
            knowsJulyHigh={knowsJulyHigh}
            onKnowsJulyHighChange={setKnowsJulyHigh}
            serverErrors={serverErrors}
          />
          <section aria-labelledby="mounting" className="flex flex-col gap-6">
            <h2 id="mounting" className="font-display text-xl font-semibold text-moss-900">
              How will it hang?
            </h2>
            <Controller
              control={form.control}
              name="facingDeg"
              render={({ field, fieldState }) => (
                <FacingField
                  value={field.value}
                  onChange={field.onChange}
                  onBlur={field.onBlur}
                  error={fieldState.error?.message}
                  lat={lat}
                />
              )}
            />
            <SiteFields />
          </section>
          <SkylineFields describes={describesSkyline} onDescribesChange={setDescribesSkyline} />
          <div className="flex flex-wrap items-center gap-4">
            <Button type="submit" size="lg">
              Check this site
            </Button>
            <p className="text-sm text-ink-soft">The check also updates as you type.</p>
          </div>
        </form>

        <div className="flex flex-col gap-8 lg:sticky lg:top-4">
          <CheckProgress busy={busy} />
          {query.error && !needsJulyHigh ? (
            <Alert tone="poor" title="The check could not run" live>
              {query.error.message}
            </Alert>
          ) : null}
          {answer ? (
            <div
              className={
                busy || query.isError ? "opacity-60 transition-opacity" : "transition-opacity"
              }
            >
              <PlacementResult answer={answer} />
            </div>
          ) : (
            <Card>
              <h2 className="font-display text-xl font-semibold text-moss-900">
                Your check appears here
              </h2>
              <p className="mt-2 text-ink-soft">
                Give the place, how the house will hang and what stands around it. We work out the
                hours of sun on the house through the maternity season, read your summers from
                nearby weather stations, and rate the site on ten rules, each with what to change.
              </p>
            </Card>
          )}
          {answer ? (
            <SaveSitePanel
              key={loaded?.name ?? "new"}
              input={current ? input : null}
              signedIn={signedIn}
              defaultName={loaded?.name}
            />
          ) : null}
          <PlacementCautions hemisphere={answer?.location.hemisphere ?? (typeof lat === "number" && lat < 0 ? "south" : "north")} />
        </div>
      </div>
    </FormProvider>
  );
}

/** Says politely that a check is running; the last answer stays on screen, dimmed. */
function CheckProgress({ busy }: { busy: boolean }) {
  return (
    <div aria-live="polite" className="min-h-6 text-sm text-ink-soft">
      {busy ? (
        <span className="inline-flex items-center gap-2">
          <Spinner className="text-moss-700" />
          Checking the site…
        </span>
      ) : null}
    </div>
  );
}

export const PlacementPlanner = withQueries(PlacementPlannerWithData);
