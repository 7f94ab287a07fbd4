import { render } from "@react-email/components";
import { convert } from "html-to-text";
import { createElement } from "react";
import { describe, expect, it } from "vitest";
import { GiftReceiptEmail } from "@/emails/gift-receipt";
import { InstallGuideEmail } from "@/emails/install-guide";
import { OrderConfirmationEmail } from "@/emails/order-confirmation";
import { buildInstallGuide } from "@/lib/mail/install-guide-content";
import type { OrgFooter } from "@/lib/mail/message-types";
import { receiptForOrder } from "@/lib/mail/order-receipt";
import { PLAIN_TEXT_OPTIONS } from "@/lib/mail/plain-text";
import { CAUTIONS } from "@/lib/safety/cautions";

const org: OrgFooter = {
  displayName: "Test Hollow Rescue",
  legalName: "Test Hollow Rescue, Inc.",
  street: "1 Test Lane",
  city: "Testville",
  state: "OR",
  zip: "97000",
  taxId: "00-0000000",
  email: "hello@test.example",
  phone: "(541) 555-0100",
};
const usd = new Intl.NumberFormat("en-US", { style: "currency", currency: "USD" });

describe("the order receipt of PRODUCT.md §6", () => {
  it("$100 paid for a $40 house: deductible $60, disclosure required (IRS Publication 1771's example)", () => {
    const receipt = receiptForOrder({
      subtotalCents: 4000,
      shippingCents: 0,
      taxCents: 0,
      giftCents: 6000,
      totalCents: 10_000,
    });
    expect(receipt.deductibleCents).toBe(6000);
    expect(receipt.disclosureRequired).toBe(true);
  });

  it("$70 paid for a $20 house: deductible $50, no disclosure required", () => {
    const receipt = receiptForOrder({
      subtotalCents: 2000,
      shippingCents: 0,
      taxCents: 0,
      giftCents: 5000,
      totalCents: 7000,
    });
    expect(receipt.deductibleCents).toBe(5000);
    expect(receipt.disclosureRequired).toBe(false);
  });

  it("counts shipping as goods and keeps sales tax out of the gift", () => {
    const receipt = receiptForOrder({
      subtotalCents: 14_900,
      shippingCents: 1900,
      taxCents: 834,
      giftCents: 2500,
      totalCents: 20_134,
    });
    expect(receipt.goodsValueCents).toBe(16_800);
    expect(receipt.deductibleCents).toBe(2500);
  });
});

describe("rendered messages", () => {
  const amounts = {
    subtotalCents: 29_800,
    shippingCents: 2600,
    taxCents: 1669,
    giftCents: 2500,
    totalCents: 36_569,
  };

  it("the confirmation shows every amount of the order, as the browser's currency formatter writes it", async () => {
    const element = createElement(OrderConfirmationEmail, {
      org,
      name: "Ada",
      orderNumber: "R-1001",
      orderUrl: "https://store.example/orders/x?t=y",
      lines: [{ name: "Hollow Four", quantity: 2, unitPriceCents: 14_900 }],
      method: "parcel",
      shipTo: "Ada, 1 Road, Tempe, AZ 85281",
      amounts,
      receipt: receiptForOrder(amounts),
    });
    const text = await render(element, { plainText: true, htmlToTextOptions: PLAIN_TEXT_OPTIONS });
    for (const cents of [29_800, 2600, 1669, 2500, 36_569])
      expect(text).toContain(usd.format(cents / 100));
    expect(text).toContain("Order R-1001 is in the workshop queue");
    // The amounts keep their columns in plain text: label, then amount, on one line.
    expect(text).toMatch(/Hollow Four × 2 \(\$149\.00 each\) +\$298\.00\n/);
    expect(text).toMatch(/Total paid +\$365\.69/);
    expect(text).toMatch(/deductible contribution .* \$25\.00/);
    expect(text).toContain("https://store.example/orders/x?t=y");
  });

  it("the install guide carries every caution in both its HTML and its plain text", async () => {
    const guide = buildInstallGuide({
      houses: [
        {
          name: "Saltbush",
          quantity: 1,
          exteriorShade: "white",
          vented: true,
          chamberCount: 4,
          mounts: ["pole"],
          backToBackKit: false,
        },
      ],
      climate: {
        known: true,
        bandId: "very-hot",
        julyHighF: 106,
        basis: "ZIP 85281",
        nearEdgeNote: null,
      },
      site: null,
      hemisphere: "north",
    });
    const element = createElement(InstallGuideEmail, {
      org,
      name: "Ada",
      orderNumber: "R-1001",
      orderUrl: "https://store.example/o",
      occasion: "paid",
      pickup: false,
      guide,
      preferencesUrl: "https://store.example/p",
    });
    const [html, text] = await Promise.all([
      render(element),
      render(element, { plainText: true, htmlToTextOptions: PLAIN_TEXT_OPTIONS }),
    ]);
    // An independent reading of the HTML (html-to-text, from the registry) finds the same words.
    const independent = convert(html, { wordwrap: false });
    for (const caution of CAUTIONS) {
      expect(text).toContain(caution.title);
      expect(independent).toContain(caution.text);
    }
    expect(text).toMatch(/light or white outside/);
    expect(text).toMatch(/Afternoon shade/);
    expect(html).toContain("#162d1c"); // the masthead in moss-900
  });

  it("the gift receipt names the organization, its tax id, the date and the no-goods statement", async () => {
    const receipt = receiptForOrder({
      subtotalCents: 0,
      shippingCents: 0,
      taxCents: 0,
      giftCents: 30_000,
      totalCents: 30_000,
    });
    const text = await render(
      createElement(GiftReceiptEmail, {
        org,
        donorName: "Ada",
        orderNumber: "R-1002",
        date: "May 1, 2026",
        amountPaidCents: 30_000,
        giftCents: 30_000,
        receipt,
      }),
      { plainText: true, htmlToTextOptions: PLAIN_TEXT_OPTIONS },
    );
    expect(text).toContain("Test Hollow Rescue, Inc.");
    expect(text).toContain("EIN): 00-0000000");
    expect(text).toContain("May 1, 2026");
    expect(text).toContain("No goods or services were provided in exchange for this gift.");
    expect(text).toContain("written acknowledgment");
  });
});
