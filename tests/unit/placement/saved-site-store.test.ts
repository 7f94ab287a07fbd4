// What the browser keeps for the cart (lib/placement/saved-site-store.ts): the lead's checkout
// reads `roostwright.site.v1` and sends `siteId` and `guestSiteToken`; anything unreadable there
// must count as "no site", never break the cart. Common practice, no source.
import { describe, expect, it } from "vitest";
import { parseSavedSite, SAVED_SITE_KEY } from "@/lib/placement/saved-site-store";

const site = {
  id: "0b6f6a34-6f43-4f4e-9a53-5c1f2b7f9e10",
  guestToken: "3HcN5teQ2gCNvrV1arvzLE_-3mmZiyLv",
  name: "Pole by the pond",
  label: "fair",
  bandId: "very-hot",
};

describe("parseSavedSite", () => {
  it("uses the agreed key", () => {
    expect(SAVED_SITE_KEY).toBe("roostwright.site.v1");
  });

  it("reads a guest's site with its token, and a signed-in buyer's without one", () => {
    expect(parseSavedSite(JSON.stringify(site))).toEqual(site);
    const { guestToken: _omitted, ...mine } = site;
    expect(parseSavedSite(JSON.stringify(mine))).toEqual(mine);
  });

  it.each([
    ["nothing stored", null],
    ["not JSON", "{oops"],
    ["an id that is not a UUID", JSON.stringify({ ...site, id: "42" })],
    ["a band we do not have", JSON.stringify({ ...site, bandId: "tropical" })],
    ["a label we do not use", JSON.stringify({ ...site, label: "excellent" })],
    ["an empty token", JSON.stringify({ ...site, guestToken: "" })],
  ])("treats %s as no site", (_case, raw) => {
    expect(parseSavedSite(raw)).toBeNull();
  });
});
