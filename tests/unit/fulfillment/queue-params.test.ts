import { describe, expect, it } from "vitest";
import {
  DEFAULT_QUEUE_PARAMS,
  queueParamsFromSearch,
  queueParamsSchema,
  queueParamsToSearch,
  statusesFor,
} from "@/lib/fulfillment/queue-params";

// Common practice, no source: a work queue opens on what still needs doing, oldest first.

describe("queue parameters", () => {
  it("defaults to open orders, oldest paid first, 25 a page", () => {
    expect(DEFAULT_QUEUE_PARAMS).toEqual({ state: "open", method: "any", q: "", sort: "paid", dir: "asc", page: 1, pageSize: 25 });
    expect(statusesFor("open")).toEqual(["paid", "packing", "packed", "shipped", "ready_for_pickup"]);
    expect(statusesFor("all")).not.toContain("pending_payment");
    expect(statusesFor("packed")).toEqual(["packed"]);
  });

  it("reads empty form fields as not given and numbers from text", () => {
    expect(queueParamsSchema.parse({ state: "", from: "", to: "", page: "3", pageSize: "50", q: "  wren " })).toMatchObject({
      state: "open",
      from: undefined,
      to: undefined,
      page: 3,
      pageSize: 50,
      q: "wren",
    });
  });

  it("refuses a page size off the list, page 0, a bad date and a backwards range, each with its message", () => {
    const issues = (input: Record<string, string>) => queueParamsSchema.safeParse(input).error?.issues.map((i) => [i.path.join("."), i.message]);
    expect(issues({ pageSize: "7" })).toEqual([["pageSize", "Show 10, 25, 50, 100 orders per page."]]);
    expect(issues({ page: "0" })).toEqual([["page", "Pages start at 1."]]);
    expect(issues({ from: "2026-02-30" })).toEqual([["from", "Enter a date like 2026-03-31."]]);
    expect(issues({ from: "2026-03-09", to: "2026-03-01" })).toEqual([["to", "The end date comes before the start date."]]);
    // A single day is a valid range.
    expect(queueParamsSchema.safeParse({ from: "2026-03-09", to: "2026-03-09" }).success).toBe(true);
  });

  it("writes only what differs from the default, and reads it back", () => {
    const params = { ...DEFAULT_QUEUE_PARAMS, state: "packed" as const, q: "RW-00042", page: 2 };
    const search = queueParamsToSearch(params);
    expect(search.toString()).toBe("state=packed&q=RW-00042&page=2");
    expect(queueParamsFromSearch(search)).toEqual(params);
    expect(queueParamsToSearch(DEFAULT_QUEUE_PARAMS).toString()).toBe("");
  });

  it("falls back to the default view for a hand-edited address it cannot read", () => {
    expect(queueParamsFromSearch({ state: "lost", page: ["2", "3"] })).toEqual(DEFAULT_QUEUE_PARAMS);
    expect(queueParamsFromSearch({ page: ["2", "3"] })).toEqual({ ...DEFAULT_QUEUE_PARAMS, page: 2 });
  });
});
