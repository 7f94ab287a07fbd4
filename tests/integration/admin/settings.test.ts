import { beforeEach, describe, expect, it, vi } from "vitest";
import { seedDemo } from "@/lib/demo/commands";
import { DEMO_ORGANIZATION } from "@/lib/demo/seed-data";
import { getOrganization, listShippingRates } from "@/lib/admin/queries";
import { quoteFromDatabase } from "@/lib/checkout/queries/quote";
import type { SessionUser } from "@/lib/auth/session";
import { resetDb } from "../../support/db";

const session = vi.hoisted(() => ({ user: null as SessionUser | null }));
vi.mock("@/lib/auth/session", () => ({ getSessionUser: async () => session.user }));

const { saveOrganizationAction, saveShippingRatesAction, saveTaxRatesAction } = await import("@/lib/admin/actions");
const as = (role: SessionUser["role"]) => ({ id: "00000000-0000-4000-8000-000000000001", name: role, email: `${role}@example.org`, role });

describe("admin settings actions", () => {
  beforeEach(async () => {
    await seedDemo(await resetDb());
    session.user = null;
  });

  it("refuses signed-out visitors and every role but admin, changing nothing", async () => {
    const input = { ...DEMO_ORGANIZATION, legalName: "Changed" };
    session.user = null;
    expect(await saveOrganizationAction(input)).toMatchObject({ ok: false, error: { code: "unauthenticated" } });
    for (const role of ["customer", "staff", "fulfillment"] as const) {
      session.user = as(role);
      expect(await saveOrganizationAction(input)).toMatchObject({ ok: false, error: { code: "forbidden" } });
      expect(await saveShippingRatesAction({ tiers: [{ maxBillableLb: 10, cents: 1 }] })).toMatchObject({ ok: false, error: { code: "forbidden" } });
    }
    expect((await getOrganization())?.legalName).toBe(DEMO_ORGANIZATION.legalName);
  });

  it("validates the tax id and names the field", async () => {
    session.user = as("admin");
    const result = await saveOrganizationAction({ ...DEMO_ORGANIZATION, taxId: "123456789" });
    expect(result).toMatchObject({ ok: false, error: { code: "bad_request", fields: { taxId: expect.stringMatching(/12-3456789/) } } });
    expect(await saveOrganizationAction({ ...DEMO_ORGANIZATION, legalName: "Cedar Hollow Wildlife Rescue Trust" })).toMatchObject({ ok: true });
    expect((await getOrganization())?.legalName).toBe("Cedar Hollow Wildlife Rescue Trust");
  });

  it("refuses duplicate tiers and applies a new rate table to the next quote", async () => {
    session.user = as("admin");
    const dup = await saveShippingRatesAction({ tiers: [{ maxBillableLb: 20, cents: 100 }, { maxBillableLb: 20, cents: 200 }] });
    expect(dup.ok).toBe(false);
    expect((await listShippingRates()).length).toBeGreaterThan(2);
    expect(await saveShippingRatesAction({ tiers: [{ maxBillableLb: 60, cents: 1234 }] })).toMatchObject({ ok: true });
    const { getDb } = await import("@/db/client");
    const { quote } = await quoteFromDatabase(await getDb(), { items: [{ slug: "twin-ridge", quantity: 1 }], method: "parcel", state: "OR", giftCents: 0 });
    expect(quote.shipping.cents).toBe(1234);
  });

  it("sets a state's tax rate in basis points", async () => {
    session.user = as("admin");
    expect(await saveTaxRatesAction({ rates: [{ state: "OR", basisPoints: 250 }] })).toMatchObject({ ok: true });
    const { getDb } = await import("@/db/client");
    const { quote } = await quoteFromDatabase(await getDb(), { items: [{ slug: "twin-ridge", quantity: 1 }], method: "pickup", giftCents: 1000 });
    // $89.00 × 2.5% = $2.225 → $2.23 (half up); the gift is not taxed.
    expect(quote.taxCents).toBe(223);
    expect(await saveTaxRatesAction({ rates: [{ state: "OR", basisPoints: 2001 }] })).toMatchObject({ ok: false });
  });
});
