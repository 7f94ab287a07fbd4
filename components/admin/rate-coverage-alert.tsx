import Link from "next/link";
import { Alert } from "@/components/ui/alert";
import { uncoveredWeights, type RateCoverage } from "@/lib/checkout/rate-coverage";

/** Tells staff ahead of time which parcels checkout will refuse for want of a rate. */
export function RateCoverageAlert({
  coverage,
  settingsLink = false,
  className,
}: {
  coverage: RateCoverage;
  settingsLink?: boolean;
  className?: string;
}) {
  if (coverage.covered) return null;
  const weights = uncoveredWeights(coverage);
  const empty = coverage.heaviestTierLb === null;
  return (
    <Alert tone="warn" className={className} title={empty ? "No shipping rates are set up" : `No shipping rate covers parcels of ${weights} billable weight`}>
      <p>
        {empty
          ? "The parcel rate table is empty, so no weight is covered."
          : `The heaviest tier goes up to ${coverage.heaviestTierLb} lb.`}
        {coverage.heaviest
          ? ` The heaviest house on sale, ${coverage.heaviest.name}, bills at ${coverage.heaviest.billableLb} lb.`
          : null}
      </p>
      <p className="mt-1">
        Checkout refuses {empty ? "every parcel" : `parcels of ${weights}`}: buyers of those houses can only choose pickup
        until a tier {coverage.toLb !== null ? `of at least ${coverage.toLb} lb ` : ""}is added
        {settingsLink ? (
          <>
            {" "}
            in <Link href="/admin/settings">the center settings</Link>
          </>
        ) : null}
        .
      </p>
    </Alert>
  );
}
