"use client";

import { Button } from "@/components/ui/button";
import { Select } from "@/components/ui/select";
import type { QueuePage } from "@/lib/fulfillment/queries/queue";
import { PAGE_SIZES } from "@/lib/fulfillment/queue-params";

/** Previous / next and how many rows a page holds. */
export function QueuePager({ page, onPage, onPageSize }: { page: QueuePage; onPage: (page: number) => void; onPageSize: (size: number) => void }) {
  return (
    <nav aria-label="Queue pages" className="flex flex-wrap items-center justify-between gap-3">
      <div className="flex items-center gap-2">
        <Button variant="secondary" size="sm" disabled={page.page <= 1} onClick={() => onPage(page.page - 1)}>
          Previous page
        </Button>
        <span className="text-ink-soft">
          Page {page.page} of {page.pageCount}
        </span>
        <Button variant="secondary" size="sm" disabled={page.page >= page.pageCount} onClick={() => onPage(page.page + 1)}>
          Next page
        </Button>
      </div>
      <div className="flex items-center gap-2">
        <label htmlFor="queue-page-size" className="text-ink-soft">
          Orders per page
        </label>
        <Select id="queue-page-size" value={page.pageSize} onChange={(e) => onPageSize(Number(e.target.value))} className="w-24">
          {PAGE_SIZES.map((size) => (
            <option key={size} value={size}>
              {size}
            </option>
          ))}
        </Select>
      </div>
    </nav>
  );
}
