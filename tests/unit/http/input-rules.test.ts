import { describe, expect, it } from "vitest";
import { decimalText } from "@/lib/http/query-number";
import { catalogQuerySchema } from "@/lib/catalog/catalog-query";
import { queueParamsSchema } from "@/lib/fulfillment/queue-params";
import { decodeSegment, headerProblem, textProblem, urlProblem, valueProblem } from "@/lib/http/input-rules";

describe("text from outside", () => {
  it("refuses NUL and every C0 control and DEL, but tab, LF and CR only in multi-line fields", () => {
    expect(textProblem("a\u0000b", "name")?.message).toMatch(/NUL/);
    for (let c = 1; c < 0x20; c++) expect(textProblem(`a${String.fromCharCode(c)}b`, "name")).not.toBeNull();
    expect(textProblem("a\u007fb", "name")).not.toBeNull();
    expect(textProblem("line one\nline two\r\n\tindent", "note", true)).toBeNull();
    expect(textProblem("bell\u0007", "note", true)).not.toBeNull();
    expect(textProblem("a\u0000", "note", true)).not.toBeNull();
    expect(textProblem("Café – “Hollow” 🦇", "name")).toBeNull();
    expect(textProblem("\ud800", "name")?.message).toMatch(/surrogate/);
    expect(textProblem("🦇", "name")).toBeNull();
  });

  it("walks bodies deeply, keys included, and refuses prototype keys", () => {
    expect(valueProblem({ contact: { name: "Ana\u0000" } })?.field).toBe("contact.name");
    expect(valueProblem({ items: [{ slug: "ok" }, { slug: "x\u0001" }] })?.field).toBe("items.1.slug");
    expect(valueProblem(JSON.parse('{"__proto__":{"admin":true}}'))?.field).toBe("__proto__");
    expect(valueProblem({ a: { constructor: 1 } })?.field).toBe("a.constructor");
    expect(valueProblem({ ["k\u0000"]: 1 })).not.toBeNull();
    expect(valueProblem({ reason: "two\nlines" })).toBeNull();
    expect(valueProblem({ name: "two\nlines" })?.field).toBe("name");
    let deep: unknown = "x";
    for (let i = 0; i < 40; i++) deep = [deep];
    expect(valueProblem(deep)?.message).toMatch(/nested/);
    expect(valueProblem({ items: [{ slug: "hollow-four", quantity: 2 }], giftCents: 0, note: "Leave at the gate.\n" })).toBeNull();
    const form = new FormData();
    form.set("altText", "ok");
    form.set("note", "bad\u0000");
    expect(valueProblem(form)?.field).toBe("note");
  });

  it("decodes path segments safely and checks the query", () => {
    expect(decodeSegment("%E0%A4%A")).toEqual({ ok: false });
    expect(decodeSegment("%ZZ")).toEqual({ ok: false });
    expect(decodeSegment("caf%C3%A9")).toEqual({ ok: true, value: "café" });
    expect(urlProblem(new URL("http://x/api/sites/%E0%A4%A"))?.field).toBe("path");
    expect(urlProblem(new URL("http://x/api/houses/a%00b"))?.message).toMatch(/NUL/);
    expect(urlProblem(new URL("http://x/api/fulfillment/orders?q=%00"))?.field).toBe("q");
    expect(urlProblem(new URL("http://x/api/fulfillment/orders?q=%ZZ"))?.field).toBe("query");
    expect(urlProblem(new URL("http://x/api/fulfillment/orders?__proto__=1"))).not.toBeNull();
    expect(urlProblem(new URL("http://x/api/houses?band=hot&chambers=4&q=caf%C3%A9+au+lait"))).toBeNull();
  });

  it("allows tab in a header but no other control character (RFC 9110 §5.5)", () => {
    expect(headerProblem("user-agent", "a\tb")).toBeNull();
    expect(headerProblem("user-agent", "a\u0001b")).not.toBeNull();
  });
});

describe("numbers from a query string", () => {
  it("reads decimal digits only", () => {
    expect(decimalText("16", false)).toBe(16);
    expect(decimalText("-4", false)).toBe(-4);
    expect(decimalText("22.5", true)).toBe(22.5);
    for (const bad of ["0x10", "1e3", "0b1", "0o7", " 16", "16 ", "Infinity", "+5", "1_000", "٣"]) expect(decimalText(bad, true)).toBe(bad);
    expect(decimalText("22.5", false)).toBe("22.5");
    expect(decimalText("", false)).toBeUndefined();
  });

  it("refuses hex and exponents in the catalog and queue parameters", () => {
    expect(catalogQuerySchema.safeParse({ chambers: "0x4" }).success).toBe(false);
    expect(catalogQuerySchema.safeParse({ maxPriceCents: "1e3" }).success).toBe(false);
    expect(catalogQuerySchema.safeParse({ chambers: "4" }).data?.chambers).toBe(4);
    expect(catalogQuerySchema.safeParse({ chambers: "" }).data?.chambers).toBeUndefined();
    expect(queueParamsSchema.safeParse({ page: "0x10" }).success).toBe(false);
    expect(queueParamsSchema.safeParse({ page: "2" }).data?.page).toBe(2);
    expect(queueParamsSchema.safeParse({}).data?.page).toBe(1);
  });
});
