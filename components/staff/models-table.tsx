"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { fetchJson } from "@/lib/http/client";
import {
  flexRender,
  getCoreRowModel,
  useReactTable,
  type SortingState,
} from "@tanstack/react-table";
import { useEffect, useState } from "react";
import { Alert } from "@/components/ui/alert";
import { Button } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { Select } from "@/components/ui/select";
import { Spinner } from "@/components/ui/spinner";
import { Table, TBody, Td, Th, THead, Tr } from "@/components/ui/table";
import {
  DEFAULT_MODELS_QUERY,
  PAGE_SIZES,
  type ModelsPage,
  type ModelsQuery,
  type SortKey,
} from "@/lib/staff/models-table-query";
import { COLUMNS, NUMERIC } from "./models-table-columns";
import { withQueries } from "@/components/with-queries";

async function fetchModels(query: ModelsQuery): Promise<ModelsPage> {
  const params = new URLSearchParams(Object.entries(query).map(([k, v]) => [k, String(v)]));
  return fetchJson<ModelsPage>(`/api/staff/models?${params}`, {
    headers: { accept: "application/json" },
    fallbackMessage: "The models could not be loaded.",
  });
}

/** The table is drawn on the server with the first page; every change after that asks the JSON route. */
function ModelsTableWithData({ initial }: { initial: ModelsPage }) {
  const [search, setSearch] = useState("");
  const [query, setQuery] = useState<ModelsQuery>(DEFAULT_MODELS_QUERY);
  // Wait for a pause in typing before asking the server.
  useEffect(() => {
    const timer = setTimeout(
      () => setQuery((q) => (q.q === search.trim() ? q : { ...q, q: search.trim(), page: 1 })),
      250,
    );
    return () => clearTimeout(timer);
  }, [search]);
  const { data, error, isFetching, isPending } = useQuery({
    queryKey: ["staff-models", query],
    queryFn: () => fetchModels(query),
    placeholderData: keepPreviousData,
    initialData: query === DEFAULT_MODELS_QUERY ? initial : undefined,
  });

  const sorting: SortingState = [{ id: query.sort, desc: query.dir === "desc" }];
  // eslint-disable-next-line react-hooks/incompatible-library -- TanStack Table returns fresh functions each render; nothing here is memoized around them
  const table = useReactTable({
    data: data?.items ?? [],
    columns: COLUMNS,
    getCoreRowModel: getCoreRowModel(),
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    rowCount: data?.total ?? 0,
    state: { sorting, pagination: { pageIndex: query.page - 1, pageSize: query.pageSize } },
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      const first = next[0];
      setQuery((q) => ({
        ...q,
        sort: (first?.id as SortKey | undefined) ?? "name",
        dir: first?.desc ? "desc" : "asc",
        page: 1,
      }));
    },
    getRowId: (r) => r.id,
  });

  const set = <K extends keyof ModelsQuery>(key: K, value: ModelsQuery[K]) =>
    setQuery((q) => ({ ...q, [key]: value, page: 1 }));

  return (
    <div className="flex flex-col gap-4">
      <div className="grid gap-4 rounded-2xl border border-paper-300 bg-paper-50 p-4 shadow-card sm:grid-cols-2 lg:grid-cols-[2fr_1fr_1fr_auto]">
        <Field label="Search by name or builder">
          <Input type="search" value={search} onChange={(e) => setSearch(e.target.value)} />
        </Field>
        <Field label="Status">
          <Select
            value={query.status}
            onChange={(e) => set("status", e.target.value as ModelsQuery["status"])}
          >
            <option value="all">Any status</option>
            <option value="draft">Draft</option>
            <option value="published">On sale</option>
            <option value="retired">Retired</option>
          </Select>
        </Field>
        <Field label="Sound Build">
          <Select
            value={query.cert}
            onChange={(e) => set("cert", e.target.value as ModelsQuery["cert"])}
          >
            <option value="all">Any</option>
            <option value="sound">Holds the Sound Build</option>
            <option value="expiring">Lapses within 30 days</option>
            <option value="not-sound">Without the Sound Build</option>
          </Select>
        </Field>
        <Field label="Per page">
          <Select value={query.pageSize} onChange={(e) => set("pageSize", Number(e.target.value))}>
            {PAGE_SIZES.map((n) => (
              <option key={n} value={n}>
                {n}
              </option>
            ))}
          </Select>
        </Field>
      </div>

      <div aria-live="polite" className="flex min-h-6 items-center gap-2 text-sm text-ink-soft">
        {isFetching ? (
          <Spinner label="Loading models" />
        ) : data ? (
          <span>{data.total === 1 ? "1 model" : `${data.total} models`}</span>
        ) : null}
      </div>

      {error ? (
        <Alert tone="poor" title="The models could not be loaded" live>
          {error.message}
        </Alert>
      ) : null}

      {!isPending && data && data.total === 0 ? (
        <EmptyState
          title="No models match"
          description="Try another search or clear the filters."
        />
      ) : (
        <Table caption="House models" hideCaption>
          <THead>
            {table.getHeaderGroups().map((group) => (
              <Tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <Th
                      key={header.id}
                      numeric={NUMERIC.has(header.column.id)}
                      sort={
                        sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"
                      }
                      onSort={() => header.column.toggleSorting(sorted === "asc")}
                    >
                      {flexRender(header.column.columnDef.header, header.getContext())}
                    </Th>
                  );
                })}
              </Tr>
            ))}
          </THead>
          <TBody>
            {table.getRowModel().rows.map((row) => (
              <Tr key={row.id}>
                {row.getVisibleCells().map((cell) => (
                  <Td key={cell.id} numeric={NUMERIC.has(cell.column.id)}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </Td>
                ))}
              </Tr>
            ))}
          </TBody>
        </Table>
      )}

      {data && data.pageCount > 1 ? (
        <nav aria-label="Pages" className="flex flex-wrap items-center justify-between gap-3">
          <Button
            variant="secondary"
            onClick={() => setQuery((q) => ({ ...q, page: q.page - 1 }))}
            disabled={data.page <= 1}
          >
            Previous page
          </Button>
          <span className="text-sm text-ink-soft">
            Page {data.page} of {data.pageCount}
          </span>
          <Button
            variant="secondary"
            onClick={() => setQuery((q) => ({ ...q, page: q.page + 1 }))}
            disabled={data.page >= data.pageCount}
          >
            Next page
          </Button>
        </nav>
      ) : null}
    </div>
  );
}

export const ModelsTable = withQueries(ModelsTableWithData);
