"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { flexRender, getCoreRowModel, useReactTable } from "@tanstack/react-table";
import { useEffect, useMemo, useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { cn } from "@/components/ui/cn";
import { EmptyState } from "@/components/ui/empty-state";
import { Spinner } from "@/components/ui/spinner";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import type { QueuePage, QueueSummary } from "@/lib/fulfillment/queries/queue";
import { fetchJson, isApiError } from "@/lib/http/client";
import { DEFAULT_QUEUE_PARAMS, queueParamsToSearch, type QueueParams, type QueueSort } from "@/lib/fulfillment/queue-params";
import { queueColumns } from "./queue-columns";
import { QueueCounts } from "./queue-counts";
import { QueueFilters } from "./queue-filters";
import { QueuePager } from "./queue-pager";
import { withQueries } from "@/components/with-queries";

async function fetchQueue(search: string): Promise<QueuePage> {
  return fetchJson<QueuePage>(`/api/fulfillment/orders?${search}`, { fallbackMessage: "The queue could not be loaded." });
}

type Props = { initialParams: QueueParams; initialPage: QueuePage; summary: QueueSummary; now: string };

/** The queue: counts, filters, a server-sorted and server-paged table, and the CSV of the view. */
function QueueBrowserWithData({ initialParams, initialPage, summary, now }: Props) {
  const [params, setParams] = useState<QueueParams>(initialParams);
  const [searchText, setSearchText] = useState(initialParams.q);
  const search = queueParamsToSearch(params).toString();
  const initialSearch = queueParamsToSearch(initialParams).toString();
  const { data, isFetching, error } = useQuery({
    queryKey: ["fulfillment-queue", search],
    queryFn: () => fetchQueue(search),
    initialData: search === initialSearch ? initialPage : undefined,
    placeholderData: keepPreviousData,
  });

  // Typing waits a moment before asking the server, so each keystroke is not a query.
  useEffect(() => {
    const timer = setTimeout(() => {
      setParams((p) => (p.q === searchText.trim() ? p : { ...p, q: searchText.trim(), page: 1 }));
    }, 300);
    return () => clearTimeout(timer);
  }, [searchText]);

  // The address holds the view, so it can be reloaded, bookmarked or sent to a colleague.
  useEffect(() => {
    window.history.replaceState(null, "", search ? `/fulfillment?${search}` : "/fulfillment");
  }, [search]);

  const update = (patch: Partial<QueueParams>) => setParams((p) => ({ ...p, page: 1, ...patch }));
  const columns = useMemo(() => queueColumns(new Date(now)), [now]);
  // eslint-disable-next-line react-hooks/incompatible-library -- TanStack Table v8 hands back fresh functions each render, so the compiler leaves this component unmemoized; one table of 100 rows at most does not need it.
  const table = useReactTable({
    data: data?.items ?? [],
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    pageCount: data?.pageCount ?? 1,
    state: { sorting: [{ id: params.sort, desc: params.dir === "desc" }] },
  });

  const sortBy = (id: QueueSort) =>
    update({ sort: id, dir: params.sort === id && params.dir === "asc" ? "desc" : "asc" });
  const exportSearch = new URLSearchParams(search);
  exportSearch.delete("page");
  exportSearch.delete("pageSize");
  const fields = isApiError(error) ? error.fields : undefined;

  return (
    <div className="flex flex-col gap-6">
      <QueueCounts summary={summary} now={new Date(now)} active={params.state} onPick={(state) => update({ state })} />
      <QueueFilters
        params={params}
        searchText={searchText}
        onSearchText={setSearchText}
        onChange={update}
        onReset={() => {
          setSearchText("");
          setParams(DEFAULT_QUEUE_PARAMS);
        }}
        fieldErrors={fields}
      />
      {error && !fields ? (
        <Alert tone="poor" title="The queue could not be loaded" live>
          {error.message}
        </Alert>
      ) : null}
      <div className="flex flex-wrap items-center justify-between gap-3">
        <p className="text-ink-soft" aria-live="polite">
          {data ? `${data.total.toLocaleString("en-US")} ${data.total === 1 ? "order" : "orders"} in this view` : ""}
          {isFetching ? <Spinner label="Loading the queue" className="ml-2 inline" /> : null}
        </p>
        <a href={`/api/fulfillment/orders.csv?${exportSearch}`} className="font-bold" download>
          Download this view as CSV
        </a>
      </div>
      {data && data.items.length === 0 ? (
        <EmptyState
          title="Nothing in this view"
          description="No paid order matches these filters. Clear them to see everything that needs work."
          action={
            <Button variant="secondary" onClick={() => { setSearchText(""); setParams(DEFAULT_QUEUE_PARAMS); }}>
              Clear filters
            </Button>
          }
        />
      ) : (
        <Table caption="Orders in this view" hideCaption aria-busy={isFetching || undefined}>
          <THead>
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sortable = header.column.getCanSort();
                  const sorted = header.column.getIsSorted();
                  const numeric = (header.column.columnDef.meta as { numeric?: boolean } | undefined)?.numeric;
                  return (
                    <Th
                      key={header.id}
                      numeric={numeric}
                      sort={sortable ? (sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none") : undefined}
                      onSort={sortable ? () => sortBy(header.column.id as QueueSort) : undefined}
                    >
                      {flexRender(header.column.columnDef.header, header.getContext())}
                    </Th>
                  );
                })}
              </tr>
            ))}
          </THead>
          <TBody>
            {table.getRowModel().rows.map((row) => {
              const oldest = row.original.id === summary.oldest?.id;
              return (
                <Tr key={row.id} className={cn(oldest && "bg-ember-50 hover:bg-ember-100")} data-oldest={oldest || undefined}>
                  {row.getVisibleCells().map((cell) => (
                    <Td key={cell.id} numeric={(cell.column.columnDef.meta as { numeric?: boolean } | undefined)?.numeric}>
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      {oldest && cell.column.id === "number" ? <span className="block text-sm font-bold text-ember-900">Waiting longest</span> : null}
                    </Td>
                  ))}
                </Tr>
              );
            })}
          </TBody>
        </Table>
      )}
      {data ? <QueuePager page={data} onPage={(page) => setParams((p) => ({ ...p, page }))} onPageSize={(pageSize) => update({ pageSize })} /> : null}
    </div>
  );
}

export const QueueBrowser = withQueries(QueueBrowserWithData);
