import type { Metadata } from "next";
import { OrganizationForm } from "@/components/admin/organization-form";
import { RateCoverageAlert } from "@/components/admin/rate-coverage-alert";
import { ShippingRatesForm } from "@/components/admin/shipping-rates-form";
import { TaxRatesForm } from "@/components/admin/tax-rates-form";
import { PageHeader, PageShell } from "@/components/page-header";
import { Card } from "@/components/ui/card";
import { GivingSettingsForm } from "@/components/giving/giving-settings-form";
import { getGivingSettings } from "@/lib/giving/queries";
import { getOrganization, getRateCoverage, listShippingRates, listTaxRates } from "@/lib/admin/queries";
import { requirePageUser } from "@/lib/auth/guard";
import type { UsState } from "@/lib/checkout/us-states";

export const metadata: Metadata = { title: "Center settings" };

export default async function AdminSettingsPage() {
  await requirePageUser("admin:settings", "/admin/settings");
  const [org, rates, taxes, giving, coverage] = await Promise.all([getOrganization(), listShippingRates(), listTaxRates(), getGivingSettings(), getRateCoverage()]);
  return (
    <PageShell>
      <PageHeader title="Center settings" lead="The details printed on receipts, the parcel rate table and the sales tax rates. Changes apply to the next quote." />
      <div className="flex flex-col gap-8">
        <RateCoverageAlert coverage={coverage} />
        <Card>
          <h2 className="mb-4 font-display text-2xl font-semibold text-moss-900">The center&apos;s details</h2>
          <OrganizationForm
            initial={
              org
                ? { legalName: org.legalName, displayName: org.displayName, street: org.street, city: org.city, state: org.state as UsState, zip: org.zip, taxId: org.taxId, email: org.email, phone: org.phone }
                : { legalName: "", displayName: "", street: "", city: "", state: "OR", zip: "", taxId: "", email: "", phone: "" }
            }
          />
        </Card>
        <Card>
          <h2 className="mb-1 font-display text-2xl font-semibold text-moss-900">Giving and planning</h2>
          <p className="mb-4 text-ink-soft">The calendar gifts are dated in, the card fee donors may cover, and the workshop&apos;s lead time for the build plan.</p>
          <GivingSettingsForm initial={giving} />
        </Card>
        <Card>
          <h2 className="mb-1 font-display text-2xl font-semibold text-moss-900">Parcel rates</h2>
          <p className="mb-4 text-ink-soft">One carton per house; each is billed at the first tier its billable weight fits under.</p>
          <ShippingRatesForm initial={rates} />
        </Card>
        <Card>
          <h2 className="mb-1 font-display text-2xl font-semibold text-moss-900">Sales tax by state</h2>
          <p className="mb-4 text-ink-soft">Applied to houses only, never to shipping or gifts. Leave blank where the center collects none.</p>
          <TaxRatesForm initial={taxes} />
        </Card>
      </div>
    </PageShell>
  );
}
