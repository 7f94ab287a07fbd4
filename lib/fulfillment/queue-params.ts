import { z } from "zod";
import { queryInt } from "@/lib/http/query-number";
import { OPEN_STATES } from "@/lib/orders/state-machine";
import { PAID_STATES, type PaidState } from "@/lib/orders/statuses";

// What the shipping desk's queue can be asked for: the same schema parses the page's address,
// the JSON route and the CSV export, so all three always show the same orders.

// The states come from lib/orders: "open" is every paid state with a next step for a volunteer
// (derived from the state machine) and "all" every paid state (unpaid and expired checkouts never
// reach the desk).
export { OPEN_STATES, PAID_STATES };
/** States at the packing bench: the oldest of these is the one to start with. */
export const BENCH_STATES = ["paid", "packing", "packed"] as const satisfies readonly PaidState[];

export const QUEUE_STATE_FILTERS = ["open", ...PAID_STATES, "all"] as const;
export type QueueStateFilter = (typeof QUEUE_STATE_FILTERS)[number];

export const QUEUE_SORTS = ["paid", "number", "name", "status"] as const;
export type QueueSort = (typeof QUEUE_SORTS)[number];

export const PAGE_SIZES = [10, 25, 50, 100] as const;

// An empty form field arrives as "": treat it as not given.
const blankToUndefined = (value: unknown) => (value === "" ? undefined : value);

const daySchema = z.preprocess(
  blankToUndefined,
  z.iso.date("Enter a date like 2026-03-31.").optional(),
);

export const queueParamsSchema = z
  .object({
    state: z.preprocess(blankToUndefined, z.enum(QUEUE_STATE_FILTERS, "Choose a state from the list.").default("open")),
    method: z.preprocess(blankToUndefined, z.enum(["any", "parcel", "pickup"], "Choose parcel, pickup or any.").default("any")),
    from: daySchema,
    to: daySchema,
    q: z.string().trim().max(100, "Search with at most 100 characters.").default(""),
    sort: z.preprocess(blankToUndefined, z.enum(QUEUE_SORTS, "Sort by paid date, order number, name or state.").default("paid")),
    dir: z.preprocess(blankToUndefined, z.enum(["asc", "desc"], "Sort up or down.").default("asc")),
    page: z.preprocess(
      blankToUndefined,
      queryInt(z.number({ error: "Pages are whole numbers." }).int("Pages are whole numbers.").min(1, "Pages start at 1.").max(100_000, "That page is too far.")).default(1),
    ),
    pageSize: z.preprocess(
      blankToUndefined,
      queryInt(
        z
          .number({ error: `Show ${PAGE_SIZES.join(", ")} orders per page.` })
          .refine((n) => (PAGE_SIZES as readonly number[]).includes(n), `Show ${PAGE_SIZES.join(", ")} orders per page.`),
      ).default(25),
    ),
  })
  .refine((p) => !p.from || !p.to || p.from <= p.to, {
    path: ["to"],
    message: "The end date comes before the start date.",
  });
export type QueueParams = z.infer<typeof queueParamsSchema>;

export const DEFAULT_QUEUE_PARAMS: QueueParams = queueParamsSchema.parse({});

/** The order states a filter stands for. */
export function statusesFor(state: QueueStateFilter): PaidState[] {
  if (state === "open") return [...OPEN_STATES];
  if (state === "all") return [...PAID_STATES];
  return [state];
}

/** The address form of a view, leaving out defaults so links stay short. */
export function queueParamsToSearch(params: QueueParams): URLSearchParams {
  const search = new URLSearchParams();
  for (const key of Object.keys(DEFAULT_QUEUE_PARAMS) as (keyof QueueParams)[]) {
    const value = params[key];
    if (value === undefined || value === "" || value === DEFAULT_QUEUE_PARAMS[key]) continue;
    search.set(key, String(value));
  }
  return search;
}

/** Reads a view from an address; a bad value falls back to the default view rather than an error page. */
export function queueParamsFromSearch(search: URLSearchParams | Record<string, string | string[] | undefined>): QueueParams {
  const entries =
    search instanceof URLSearchParams
      ? Object.fromEntries(search.entries())
      : Object.fromEntries(Object.entries(search).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
  const parsed = queueParamsSchema.safeParse(entries);
  return parsed.success ? parsed.data : DEFAULT_QUEUE_PARAMS;
}
