import { describe, expect, it } from "vitest";
import { centerProfile, FALLBACK_CENTER_NAME, mailboxAddress, mailFrom } from "@/lib/admin/center-profile";

const ORG = { displayName: "Prairie Owl Refuge", street: "1 Test Lane", city: "Testville", state: "KS", zip: "66000", phone: "(555) 555-0100", email: "hi@owl.example" };

describe("centerProfile", () => {
  it("reads the settings row", () => {
    expect(centerProfile(ORG)).toEqual({ configured: true, name: "Prairie Owl Refuge", street: "1 Test Lane", city: "Testville", state: "KS", zip: "66000", phone: "(555) 555-0100", email: "hi@owl.example" });
  });
  it("falls back to the store's own name without a row or with a blank name", () => {
    expect(centerProfile(null)).toMatchObject({ configured: false, name: FALLBACK_CENTER_NAME, city: "" });
    expect(centerProfile({ ...ORG, displayName: "   " })).toMatchObject({ configured: false, name: "Roostwright" });
  });
});

describe("mailFrom", () => {
  it("keeps the configured address and puts the center's name in front", () => {
    expect(mailboxAddress("Store <store@x.example>")).toBe("store@x.example");
    expect(mailboxAddress(" store@x.example ")).toBe("store@x.example");
    expect(mailFrom("Store <store@x.example>", "Prairie Owl Refuge")).toBe("Prairie Owl Refuge <store@x.example>");
    expect(mailFrom("store@x.example", "Prairie Owl Refuge")).toBe("Prairie Owl Refuge <store@x.example>");
  });
  it("quotes a name with special characters and strips what could forge the header", () => {
    expect(mailFrom("s@x.example", "Owl Refuge, Inc.")).toBe('"Owl Refuge, Inc." <s@x.example>');
    expect(mailFrom("s@x.example", 'Owl "Refuge"\r\nBcc: <a@b.example>')).toBe('"Owl Refuge Bcc: a@b.example" <s@x.example>');
  });
  it("without a name uses the configured mailbox as it is", () => {
    expect(mailFrom("Store <store@x.example>", null)).toBe("Store <store@x.example>");
    expect(mailFrom("Store <store@x.example>", "  ")).toBe("Store <store@x.example>");
  });
});
