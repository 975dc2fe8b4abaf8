"use client";

import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type ColumnFiltersState,
  type FilterFn,
  type SortingState,
} from "@tanstack/react-table";
import { useVirtualizer } from "@tanstack/react-virtual";
import { useMemo, useRef, useState } from "react";
import { Input } from "@/components/ui/input";
import { Label } from "@/components/ui/label";
import { Select } from "@/components/ui/select";
import { compareStateCounts, formatMassSquared } from "@/lib/spectrum";
import { dimensionLabel, formatPointCount, isNumericDimension, type PointVerdict, type SweepDefinition, type SweepPointRow } from "@/lib/sweeps";
import { cn } from "@/lib/utils";
import { verdictLabels, verdictTextClass } from "./verdict-style";

export interface SweepPointsTableProps {
  definition: SweepDefinition;
  rows: SweepPointRow[];
  totalPoints: number;
  selected: number | null;
  onSelect: (index: number) => void;
}

/** Height of one row in px; the virtualiser lays rows out by it. */
const rowHeight = 36;

const verdictFilter: FilterFn<SweepPointRow> = (row, _columnId, value: PointVerdict | "") => value === "" || row.original.verdict === value;
const textFilter: FilterFn<SweepPointRow> = (row, _columnId, value: string) => {
  const needle = value.trim().toLowerCase();
  if (!needle) return true;
  const point = row.original;
  return [String(point.index), ...point.labels, point.gaugeGroup ?? "", point.problem ?? ""].some((text) => text.toLowerCase().includes(needle));
};

/**
 * Every stored point in a sortable, filterable table; only the rows in view are rendered, so it
 * stays quick at 200,000 points. Each row opens its point.
 */
export function SweepPointsTable({ definition, rows, totalPoints, selected, onSelect }: SweepPointsTableProps) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const [globalFilter, setGlobalFilter] = useState("");

  const columns = useMemo<ColumnDef<SweepPointRow>[]>(
    () => [
      { id: "index", header: "Point", accessorFn: (row) => row.index },
      ...definition.dimensions.map(
        (dimension, d): ColumnDef<SweepPointRow> => ({
          id: `dimension-${d}`,
          header: dimensionLabel(dimension),
          accessorFn: (row) => (isNumericDimension(dimension) ? Number(row.labels[d]) : (row.labels[d] ?? "")),
          cell: ({ row }) => row.original.labels[d],
        }),
      ),
      {
        id: "verdict",
        header: "Verdict",
        accessorFn: (row) => row.verdict,
        filterFn: verdictFilter,
        cell: ({ row }) => (
          <span className={verdictTextClass[row.original.verdict]} title={row.original.problem ?? undefined}>
            {verdictLabels[row.original.verdict]}
          </span>
        ),
      },
      { id: "supercharges", header: "Supercharges", accessorFn: (row) => row.supercharges ?? -1, cell: ({ row }) => row.original.supercharges ?? "—" },
      { id: "tachyonicSectors", header: "Tachyonic sectors", accessorFn: (row) => row.tachyonicSectors },
      {
        id: "lightest",
        header: "Lightest α′M²",
        accessorFn: (row) => row.lightestMassSquared,
        sortUndefined: "last",
        sortingFn: (a, b) => (a.original.lightestMassSquared ?? Number.POSITIVE_INFINITY) - (b.original.lightestMassSquared ?? Number.POSITIVE_INFINITY),
        cell: ({ row }) => formatMassSquared(row.original.lightestMassSquared),
      },
      {
        id: "massless",
        header: "Massless states",
        accessorFn: (row) => row.masslessStates,
        sortingFn: (a, b) => compareStateCounts(a.original.masslessStates, b.original.masslessStates),
        cell: ({ row }) => row.original.masslessStates ?? "—",
      },
      { id: "gaugeGroup", header: "Gauge group", accessorFn: (row) => row.gaugeGroup ?? "", cell: ({ row }) => row.original.gaugeGroup ?? row.original.problem ?? "" },
    ],
    [definition],
  );

  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting, columnFilters, globalFilter },
    onSortingChange: setSorting,
    onColumnFiltersChange: setColumnFilters,
    onGlobalFilterChange: setGlobalFilter,
    globalFilterFn: textFilter,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  const shown = table.getRowModel().rows;

  const scrollRef = useRef<HTMLDivElement>(null);
  const virtualizer = useVirtualizer({ count: shown.length, getScrollElement: () => scrollRef.current, estimateSize: () => rowHeight, overscan: 12 });
  const items = virtualizer.getVirtualItems();
  const paddingTop = items[0]?.start ?? 0;
  const paddingBottom = virtualizer.getTotalSize() - (items[items.length - 1]?.end ?? 0);
  const verdict = (table.getColumn("verdict")?.getFilterValue() as string | undefined) ?? "";

  return (
    <div className="grid gap-3">
      <div className="flex flex-wrap items-end gap-3">
        <div className="grid gap-1.5">
          <Label htmlFor="sweep-filter-verdict">Filter by verdict</Label>
          <Select id="sweep-filter-verdict" value={verdict} onChange={(event) => table.getColumn("verdict")?.setFilterValue(event.target.value || undefined)} className="w-44">
            <option value="">All</option>
            {(Object.keys(verdictLabels) as PointVerdict[]).map((value) => (
              <option key={value} value={value}>
                {verdictLabels[value]}
              </option>
            ))}
          </Select>
        </div>
        <div className="grid gap-1.5">
          <Label htmlFor="sweep-filter-text">Search values, gauge groups, reasons</Label>
          <Input id="sweep-filter-text" value={globalFilter} onChange={(event) => setGlobalFilter(event.target.value)} className="w-64" placeholder="e.g. U(2) or antibrane" />
        </div>
        <p className="pb-2 text-sm text-muted-foreground" aria-live="polite">
          {formatPointCount(shown.length)} of {formatPointCount(rows.length)} stored points shown
          {rows.length < totalPoints ? ` (${formatPointCount(totalPoints - rows.length)} still to come)` : ""}
        </p>
      </div>
      <div ref={scrollRef} className="max-h-[28rem] overflow-auto rounded-lg border border-border bg-surface" tabIndex={0} aria-label="Sweep points">
        <table className="w-full border-collapse text-sm tabular" aria-rowcount={shown.length + 1}>
          <thead className="sticky top-0 z-10 bg-surface-muted">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"}
                      className="h-9 px-3 text-left text-xs font-semibold whitespace-nowrap text-muted-foreground"
                    >
                      <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex items-center gap-1 hover:text-foreground">
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}</span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {paddingTop > 0 ? (
              <tr aria-hidden="true">
                <td style={{ height: paddingTop }} colSpan={columns.length} />
              </tr>
            ) : null}
            {items.map((item) => {
              const row = shown[item.index];
              if (!row) return null;
              const point = row.original;
              return (
                <tr
                  key={row.id}
                  aria-rowindex={item.index + 2}
                  aria-selected={selected === point.index}
                  className={cn("border-b border-border", selected === point.index ? "bg-accent-soft" : "hover:bg-surface-muted/50")}
                  style={{ height: rowHeight }}
                >
                  {row.getVisibleCells().map((cell) =>
                    cell.column.id === "index" ? (
                      <td key={cell.id} className="px-3 whitespace-nowrap">
                        <button type="button" className="font-mono text-accent hover:underline" onClick={() => onSelect(point.index)} aria-label={`Open point ${point.index}`}>
                          #{point.index}
                        </button>
                      </td>
                    ) : (
                      <td key={cell.id} className="px-3 whitespace-nowrap">
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </td>
                    ),
                  )}
                </tr>
              );
            })}
            {paddingBottom > 0 ? (
              <tr aria-hidden="true">
                <td style={{ height: paddingBottom }} colSpan={columns.length} />
              </tr>
            ) : null}
          </tbody>
        </table>
        {rows.length === 0 ? <p className="p-4 text-sm text-muted-foreground">No point is stored yet.</p> : null}
      </div>
    </div>
  );
}
