import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it } from "vitest";
import { orders } from "@/db/schema";
import { getOrderReceipt } from "@/lib/checkout/queries/receipt";
import { saveGivingSettings } from "@/lib/giving/commands/settings";
import { formatCenterDate } from "@/lib/giving/center-time";
import { getCenterTimeZone, getGivingSettings } from "@/lib/giving/queries";
import { resetDb } from "../../support/db";

describe("the center's time zone setting", () => {
  beforeEach(async () => {
    await resetDb();
  });

  it("defaults to the demo center's zone and keeps what the admin saves", async () => {
    expect(await getCenterTimeZone()).toBe("America/Los_Angeles");
    await saveGivingSettings({ timeZone: "America/New_York", feeBasisPoints: 250, feeFixedCents: 25, leadTimeWeeks: 8 });
    expect(await getGivingSettings()).toEqual({ timeZone: "America/New_York", feeBasisPoints: 250, feeFixedCents: 25, leadTimeWeeks: 8 });
  });

  it("dates a receipt paid at 04:30 UTC on January 1 on December 31 when the center is in New York", async () => {
    await saveGivingSettings({ timeZone: "America/New_York", feeBasisPoints: 290, feeFixedCents: 30, leadTimeWeeks: 6 });
    const db = await resetDbOnlyHandle();
    const [order] = await db
      .insert(orders)
      .values({ email: "d@example.org", name: "Dana Quill", accessToken: "t", status: "paid", method: "none", subtotalCents: 0, shippingCents: 0, taxCents: 0, giftCents: 5000, totalCents: 5000, paidAt: new Date("2027-01-01T04:30:00Z") })
      .returning();
    const receipt = await getOrderReceipt(order!);
    expect(receipt.timeZone).toBe("America/New_York");
    expect(formatCenterDate(new Date(receipt.date!), receipt.timeZone)).toBe("December 31, 2026");
    await db.delete(orders).where(eq(orders.id, order!.id));
  });
});

async function resetDbOnlyHandle() {
  const { getDb } = await import("@/db/client");
  return getDb();
}
