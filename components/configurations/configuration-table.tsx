"use client";

import { useQuery } from "@tanstack/react-query";
import {
  flexRender,
  getCoreRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from "@tanstack/react-table";
import Link from "next/link";
import { useEffect, useMemo, useState } from "react";
import type { Theory } from "@/lib/boundary/types";
import { formatDate } from "@/lib/format-date";
import {
  configurationQueries,
  type ConfigurationListParams,
  type ConfigurationPageJson,
  type ConfigurationSummaryJson,
} from "@/lib/client/configurations";
import { formatMassSquared } from "@/lib/spectrum";
import { cn } from "@/lib/utils";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { SupersymmetryBadge } from "@/components/collaboration/result-badges";

export interface ConfigurationTableProps {
  /** One group's configurations; without it, every configuration the user can see. */
  groupId?: string;
  /** Without a group: all accessible configurations, or only those the user created. */
  scope?: "accessible" | "created";
  /** Accessible name of the table. */
  label?: string;
  pageSize?: number;
  /** Server-rendered first page (for the default filters), shown without a loading state. */
  initialData?: ConfigurationPageJson;
  /** Shown when there is nothing at all (no filters). */
  emptyMessage?: string;
}

type SortKey = NonNullable<ConfigurationListParams["sort"]>;

/** Table columns that sort on the server, by column id. */
const sortKeys: Record<string, SortKey> = { title: "title", stackCount: "stacks", lightestMassSquared: "lightest", updatedAt: "updated" };

/**
 * Configurations in a table with search, sort, a theory filter and pagination, all done by
 * the server through `GET /api/configurations`.
 */
export function ConfigurationTable({ groupId, scope = "accessible", label = "Configurations", pageSize = 10, initialData, emptyMessage }: ConfigurationTableProps) {
  const [searchText, setSearchText] = useState("");
  const [search, setSearch] = useState("");
  const [theory, setTheory] = useState<Theory | "">("");
  const [sorting, setSorting] = useState<SortingState>([{ id: "updatedAt", desc: true }]);
  const [page, setPage] = useState(1);

  useEffect(() => {
    const timer = setTimeout(() => {
      setSearch(searchText.trim());
      setPage(1);
    }, 250);
    return () => clearTimeout(timer);
  }, [searchText]);

  const sort = sorting[0];
  const params: ConfigurationListParams = {
    groupId,
    scope: groupId ? undefined : scope,
    search: search || undefined,
    theory: theory || undefined,
    sort: sort ? sortKeys[sort.id] : "updated",
    direction: sort?.desc === false ? "asc" : "desc",
    page,
    pageSize,
  };
  const isDefault = !search && !theory && page === 1 && sort?.id === "updatedAt" && sort.desc;
  const query = useQuery({ ...configurationQueries.list(params), initialData: isDefault ? initialData : undefined });
  const data = query.data;
  const total = data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / pageSize));

  const columns = useMemo<ColumnDef<ConfigurationSummaryJson>[]>(
    () => [
      {
        id: "title",
        accessorKey: "title",
        header: "Title",
        cell: ({ row }) => (
          <div className="min-w-0">
            <Link href={`/configurations/${row.original.id}`} className="font-medium hover:text-accent hover:underline">
              {row.original.title}
            </Link>
            {!groupId ? (
              <div className="text-xs text-muted-foreground">{row.original.group.kind === "personal" ? "Personal space" : row.original.group.name}</div>
            ) : null}
          </div>
        ),
      },
      { id: "theory", accessorKey: "theory", header: "Theory", enableSorting: false, cell: ({ row }) => <Badge variant="outline">{row.original.theory}</Badge> },
      { id: "stackCount", accessorKey: "stackCount", header: "Stacks", cell: ({ row }) => <span className="font-mono">{row.original.stackCount}</span> },
      {
        id: "lightestMassSquared",
        accessorKey: "lightestMassSquared",
        header: "Lightest \u03b1\u2032M\u00b2",
        cell: ({ row }) =>
          row.original.lightestMassSquared === null ? (
            <span className="text-muted-foreground">&mdash;</span>
          ) : (
            <span className="font-mono whitespace-nowrap">
              {formatMassSquared(row.original.lightestMassSquared)}
              {row.original.tachyonic ? <span className="ml-1 font-sans text-xs text-danger-soft-foreground">tachyon</span> : null}
            </span>
          ),
      },
      {
        id: "supercharges",
        accessorKey: "supercharges",
        header: "Supersymmetry",
        enableSorting: false,
        cell: ({ row }) => <SupersymmetryBadge supercharges={row.original.supercharges} />,
      },
      {
        id: "updatedAt",
        accessorKey: "updatedAt",
        header: "Updated",
        cell: ({ row }) => (
          <time dateTime={row.original.updatedAt} className="whitespace-nowrap text-muted-foreground">
            {formatDate(row.original.updatedAt)}
          </time>
        ),
      },
      { id: "author", accessorFn: (row) => row.author.name, header: "Author", enableSorting: false },
    ],
    [groupId],
  );

  const table = useReactTable({
    data: data?.items ?? [],
    columns,
    state: { sorting },
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    enableSortingRemoval: false,
    onSortingChange: (updater) => {
      setSorting(updater);
      setPage(1);
    },
    getCoreRowModel: getCoreRowModel(),
  });

  const filtered = Boolean(search || theory);
  return (
    <div className="grid gap-3">
      <div className="flex flex-wrap items-center gap-2">
        <input
          type="search"
          value={searchText}
          onChange={(event) => setSearchText(event.target.value)}
          placeholder="Search titles"
          aria-label={`Search ${label.toLowerCase()}`}
          className="h-9 w-56 rounded-md border border-border-strong bg-surface px-3 text-sm"
        />
        <select
          value={theory}
          onChange={(event) => {
            setTheory(event.target.value as Theory | "");
            setPage(1);
          }}
          aria-label="Filter by theory"
          className="h-9 rounded-md border border-border-strong bg-surface px-2 text-sm"
        >
          <option value="">All theories</option>
          <option value="IIA">IIA</option>
          <option value="IIB">IIB</option>
          <option value="bosonic">bosonic</option>
        </select>
        <span className="ml-auto text-xs text-muted-foreground" aria-live="polite">
          {query.isFetching ? "Loading\u2026" : `${total} configuration${total === 1 ? "" : "s"}`}
        </span>
      </div>
      <div className="overflow-x-auto rounded-lg border border-border bg-surface">
        <table className="w-full border-collapse text-sm" aria-label={label}>
          <thead className="bg-surface-muted/70 text-xs text-muted-foreground">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  const content = flexRender(header.column.columnDef.header, header.getContext());
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                      className="h-9 px-3 text-left font-semibold tracking-wide"
                    >
                      {header.column.getCanSort() ? (
                        <button
                          type="button"
                          onClick={header.column.getToggleSortingHandler()}
                          className="inline-flex items-center gap-1 hover:text-foreground focus-visible:outline-2 focus-visible:outline-ring"
                        >
                          {content}
                          <span aria-hidden="true">{sorted === "asc" ? "\u25b2" : sorted === "desc" ? "\u25bc" : "\u2195"}</span>
                        </button>
                      ) : (
                        content
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody className={cn(query.isFetching && "opacity-70")}>
            {query.isError ? (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-danger-soft-foreground">
                  {query.error.message}{" "}
                  <button type="button" className="underline" onClick={() => void query.refetch()}>
                    Try again
                  </button>
                </td>
              </tr>
            ) : !data ? (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-muted-foreground">
                  Loading configurations&hellip;
                </td>
              </tr>
            ) : data.items.length === 0 ? (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-muted-foreground">
                  {filtered ? "No configuration matches these filters." : (emptyMessage ?? "No configurations yet.")}
                </td>
              </tr>
            ) : (
              table.getRowModel().rows.map((row) => (
                <tr key={row.id} className="border-t border-border hover:bg-surface-muted/50">
                  {row.getVisibleCells().map((cell) => (
                    <td key={cell.id} className="px-3 py-2 align-middle">
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              ))
            )}
          </tbody>
        </table>
      </div>
      {pages > 1 ? (
        <nav aria-label={`${label} pages`} className="flex items-center justify-end gap-2 text-sm">
          <Button variant="secondary" size="sm" onClick={() => setPage((p) => Math.max(1, p - 1))} disabled={page <= 1}>
            Previous
          </Button>
          <span className="text-muted-foreground">
            Page {page} of {pages}
          </span>
          <Button variant="secondary" size="sm" onClick={() => setPage((p) => Math.min(pages, p + 1))} disabled={page >= pages}>
            Next
          </Button>
        </nav>
      ) : null}
    </div>
  );
}
