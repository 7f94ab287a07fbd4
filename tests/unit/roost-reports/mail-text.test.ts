import { render } from "@react-email/components";
import { createElement } from "react";
import { describe, expect, it } from "vitest";
import { RoostReportAdviceEmail } from "@/emails/roost-report-advice";
import { RoostReportAskEmail } from "@/emails/roost-report-ask";
import type { OrgFooter } from "@/lib/mail/message-types";
import { PLAIN_TEXT_OPTIONS } from "@/lib/mail/plain-text";
import { CAUTIONS } from "@/lib/safety/cautions";

// A mail program that turns plain-text addresses into links takes a full stop or comma right
// after an address as part of it; the order page then cannot find the order. No link in the
// plain text of the roost-report e-mails may be followed by punctuation.
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
const orderUrl = "https://store.example/orders/3b0c5f1e-0000-4000-8000-000000000001?t=abc_DEF-123";
const stopUrl = "https://store.example/roost-reports/stop?token=r1.stop.sig";

async function plain(element: ReturnType<typeof createElement>) {
  return render(element, { plainText: true, htmlToTextOptions: PLAIN_TEXT_OPTIONS });
}

function urlsIn(text: string): string[] {
  return text.match(/https?:\/\/[^\s<>\]]+/g) ?? [];
}

describe("roost-report e-mails in plain text", () => {
  const cases = [
    [
      "the end-of-season question",
      createElement(RoostReportAskEmail, {
        org,
        name: "Ada",
        seasonLabel: "2026",
        orderUrl,
        stopUrl,
        cautions: CAUTIONS,
        houses: [{ title: "Hollow Four", links: [{ label: "No sign yet", href: "https://store.example/roost-reports/answer?token=r1.a.b" }] }],
      }),
    ],
    [
      "the second-summer advice",
      createElement(RoostReportAdviceEmail, {
        org,
        name: "Ada",
        houseTitles: ["Hollow Four"],
        advice: ["Move it to a sunnier spot."],
        plannerUrl: "https://store.example/placement",
        orderUrl,
        stopUrl,
        cautions: CAUTIONS,
      }),
    ],
  ] as const;

  it.each(cases)("%s: the order and stop links are there, and none is followed by punctuation", async (_name, element) => {
    const text = await plain(element);
    const urls = urlsIn(text);
    expect(urls.some((u) => u.startsWith(orderUrl))).toBe(true);
    expect(urls.some((u) => u.startsWith(stopUrl))).toBe(true);
    for (const url of urls) expect(url, `in: …${text.slice(Math.max(0, text.indexOf(url) - 40), text.indexOf(url) + url.length + 5)}…`).not.toMatch(/[.,;:!?)]$/);
  });
});
