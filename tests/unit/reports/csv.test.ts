import { describe, expect, it } from "vitest";
import { buildPlanCsv, salesCsv, stockCsv } from "@/lib/reports/csv";
import { reportRange } from "@/lib/reports/range";

describe("the reports' CSV files", () => {
  it("write sales by month with a total row, CRLF records and dollar numbers", () => {
    const csv = salesCsv({
      months: [
        { month: "2027-01", orders: 2, salesCents: 26_998, oneTimeGiftCents: 7_500, monthlyGiftCents: 0 },
        { month: "2027-02", orders: 0, salesCents: 0, oneTimeGiftCents: 0, monthlyGiftCents: 2_606 },
      ],
      totals: { orders: 2, salesCents: 26_998, oneTimeGiftCents: 7_500, monthlyGiftCents: 2_606, averageOrderCents: 13_499 },
    });
    expect(csv).toBe(
      "month,orders,sales_usd,one_time_gifts_usd,monthly_gifts_usd\r\n2027-01,2,269.98,75,0\r\n2027-02,0,0,0,26.06\r\ntotal,2,269.98,75,26.06\r\n",
    );
  });

  it("quote commas and quotes and guard names that a spreadsheet would run as a formula", () => {
    const csv = stockCsv([
      { slug: "a", name: '=HYPERLINK("x")', stock: 2, priceCents: 14_900, valueCents: 29_800 },
      { slug: "b", name: "+1 box", stock: 0, priceCents: 8_900, valueCents: 0 },
      { slug: "c", name: "-x", stock: 1, priceCents: 100, valueCents: 100 },
      { slug: "d", name: "@sum, cedar", stock: 1, priceCents: 5, valueCents: 5 },
      { slug: "e", name: "Plain", stock: 3, priceCents: 1_001, valueCents: 3_003 },
    ]);
    const lines = csv.split("\r\n");
    expect(lines[0]).toBe("model,slug,in_stock,list_price_usd,stock_value_usd");
    expect(lines[1]).toBe(`"'=HYPERLINK(""x"")",a,2,149,298`);
    expect(lines[2]).toBe("'+1 box,b,0,89,0");
    expect(lines[3]).toBe("'-x,c,1,1,1");
    expect(lines[4]).toBe(`"'@sum, cedar",d,1,0.05,0.05`);
    expect(lines[5]).toBe("Plain,e,3,10.01,30.03");
    expect(lines[6]).toBe("total,,7,,329.08");
    expect(lines[7]).toBe("");
  });

  it("write the build plan line by line", () => {
    const csv = buildPlanCsv({ horizon: [], basis: [], springStarts: "2027-03-01", startBy: "2027-01-18", lines: [{ slug: "twin-ridge", name: "Twin Ridge", stock: 3, expected: 10, build: 7 }] });
    expect(csv).toBe("model,slug,in_stock,sold_same_months_last_year,build\r\nTwin Ridge,twin-ridge,3,10,7\r\n");
  });
});

describe("the reports' date range", () => {
  it("defaults to the center's year so far", () => {
    expect(reportRange({}, "2027-05-09")).toEqual({ from: "2027-01-01", to: "2027-05-09" });
  });
  it("keeps a valid range from the address, both days included", () => {
    expect(reportRange({ from: "2026-12-31", to: "2027-01-01" }, "2027-05-09")).toEqual({ from: "2026-12-31", to: "2027-01-01" });
  });
  it("refuses malformed or impossible days and a to before from", () => {
    expect(reportRange({ from: "2027-02-30", to: "x" }, "2027-05-09")).toEqual({ from: "2027-01-01", to: "2027-05-09" });
    expect(reportRange({ from: "2027-04-01", to: "2027-03-01" }, "2027-05-09")).toEqual({ from: "2027-04-01", to: "2027-05-09" });
    expect(reportRange({ from: "2027-06-01" }, "2027-05-09")).toEqual({ from: "2027-06-01", to: "2027-06-01" });
    expect(reportRange({ from: ["2027-01-01"] }, "2027-05-09")).toEqual({ from: "2027-01-01", to: "2027-05-09" });
  });
});
