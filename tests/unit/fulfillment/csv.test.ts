import { describe, expect, it } from "vitest";
import { csvField, toCsv } from "@/lib/fulfillment/csv";
import { QUEUE_CSV_HEADER, queueToCsv } from "@/lib/fulfillment/queue-csv";

// Source: RFC 4180 (2005), section 2, rules 1–7 and their examples; the formula guard follows
// OWASP's "CSV Injection" page (from memory).

describe("RFC 4180 fields", () => {
  it("ends every record, the last included, with CRLF (rule 1 and 2)", () => {
    expect(toCsv({ header: ["a", "b"], rows: [["x", "y"]] })).toBe("a,b\r\nx,y\r\n");
  });

  it("quotes fields holding a comma, CR/LF or a quote, doubling the quote (rules 5–7)", () => {
    // Rule 7's example: "aaa","b""bb","ccc"
    expect(csvField('b"bb')).toBe('"b""bb"');
    // Rule 6's example: "aaa","b CRLF bb","ccc"
    expect(csvField("b\r\nbb")).toBe('"b\r\nbb"');
    expect(csvField("Fernbrook, WI")).toBe('"Fernbrook, WI"');
    expect(csvField("plain")).toBe("plain");
  });

  it("writes numbers as they are and nothing for missing values", () => {
    expect(csvField(-3)).toBe("-3");
    expect(csvField(null)).toBe("");
    expect(csvField(undefined)).toBe("");
    expect(csvField(Number.NaN)).toBe("");
  });
});

describe("spreadsheet formulas from a public form", () => {
  it.each(["=1+1", "+1", "-1", "@SUM(A1)", "\tx", "\rx"])("defuses %j with an apostrophe", (text) => {
    expect(csvField(text).replace(/^"|"$/g, "").startsWith("'")).toBe(true);
  });

  it("leaves ordinary names alone", () => {
    expect(csvField("Ana-Lucía O'Neil")).toBe("Ana-Lucía O'Neil");
  });
});

describe("the queue export", () => {
  it("has one column per header and the store's words", () => {
    const csv = queueToCsv([
      {
        number: 42,
        name: "Wren Alcott",
        email: "wren@example.org",
        status: "packed",
        method: "parcel",
        paidAt: "2026-07-04T19:30:00Z",
        houses: 2,
        boxes: 2,
        boxesShipped: 1,
        shipTo: { city: "Fernbrook", state: "WI", zip: "53703" },
      },
    ]);
    const [header, row] = csv.split("\r\n");
    expect(header!.split(",")).toHaveLength(QUEUE_CSV_HEADER.length);
    // 19:30 UTC on July 4 is 12:30 PM Pacific daylight time (UTC−7).
    expect(row).toMatch(/^RW-00042,Wren Alcott,wren@example\.org,Boxed and weighed,Parcel,"Jul 4, 2026, 12:30[\s\u202f]PM",2,2,1,Fernbrook,WI 53703$/);
  });
});
