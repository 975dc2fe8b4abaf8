"use client";

import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from "@tanstack/react-table";
import { useMemo, useState } from "react";
import type { LevelRow, SectorKind, ZeroPoint } from "@/lib/boundary/types";
import { rationalToNumber } from "@/lib/boundary/rational";
import { compareResultNumbers, compareStateCounts, formatNumber, isTachyonicState, unstretchedMassSquared } from "@/lib/spectrum";
import { cn } from "@/lib/utils";
import { MassSquaredText, MassText } from "./mass-text";

export interface SectorLevelsTableProps {
  /** Caption naming the sector, for assistive technology. */
  caption: string;
  rows: LevelRow[];
  /** Zero-point energies of the sector, to read alpha' M^2 at zero separation (N + a) of each row. */
  zeroPoint: ZeroPoint;
  /** Only rows of this kind (NS, R, bosonic), or all. */
  kind: SectorKind | "all";
  /** Only rows with alpha' M^2 at zero separation (N + a) up to this value. */
  massCap: number;
  showGeV: boolean;
}

/** The levels of one sector, sortable by any column, filtered by kind and by alpha' M^2 at zero separation. */
export function SectorLevelsTable({ caption, rows, zeroPoint, kind, massCap, showGeV }: SectorLevelsTableProps) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const columns = useMemo<ColumnDef<LevelRow>[]>(
    () => [
      { accessorKey: "sector", header: "Sector", filterFn: (row, _id, value: string) => value === "all" || row.original.sector === value },
      {
        accessorKey: "level",
        header: "Oscillator level N",
        sortingFn: (a, b) => compareResultNumbers(a.original.level, b.original.level),
        filterFn: (row, _id, value: number) => {
          const unstretched = unstretchedMassSquared(row.original, zeroPoint);
          return unstretched === null || rationalToNumber(unstretched) <= value;
        },
      },
      {
        accessorKey: "massSquared",
        header: "\u03b1\u2032M\u00b2",
        sortingFn: (a, b) => compareResultNumbers(a.original.massSquared, b.original.massSquared),
        cell: ({ row }) => <MassSquaredText value={row.original.massSquared} />,
      },
      { accessorKey: "mass", header: "M\u221a\u03b1\u2032", cell: ({ row }) => <MassText value={row.original.mass} /> },
      ...(showGeV
        ? [{ accessorKey: "massGeV", header: "M (GeV)", cell: ({ row }) => formatNumber(row.original.massGeV ?? null) } satisfies ColumnDef<LevelRow>]
        : []),
      {
        accessorKey: "states",
        header: "States (light-cone)",
        sortingFn: (a, b) => compareStateCounts(a.original.states, b.original.states),
        cell: ({ row }) => row.original.states ?? <span title={row.original.note}>&mdash;</span>,
      },
      ...(rows.some((row) => row.projected)
        ? [
            {
              id: "projected",
              header: "Symmetric / antisymmetric",
              cell: ({ row }) =>
                row.original.projected ? `${row.original.projected.symmetric} / ${row.original.projected.antisymmetric}` : "\u2014",
            } satisfies ColumnDef<LevelRow>,
          ]
        : []),
      {
        accessorKey: "withChanPaton",
        header: "With Chan-Paton",
        sortingFn: (a, b) => compareStateCounts(a.original.withChanPaton, b.original.withChanPaton),
      },
    ],
    [showGeV, zeroPoint, rows],
  );
  const columnFilters = useMemo(
    () => [
      { id: "sector", value: kind },
      { id: "level", value: massCap },
    ],
    [kind, massCap],
  );
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting, columnFilters },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  const visible = table.getRowModel().rows;
  const notes = [...new Set(rows.map((r) => r.note).filter((n): n is string => Boolean(n)))];

  return (
    <div className="grid gap-1">
      <div className="overflow-x-auto rounded-md border border-border">
        <table className="w-full border-collapse text-xs">
          <caption className="sr-only">{caption}</caption>
          <thead className="bg-surface-muted/70 text-muted-foreground">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : "none"}
                      className={cn("px-2 py-1 font-semibold", header.column.id === "sector" ? "text-left" : "text-right")}
                    >
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="inline-flex items-center gap-1 rounded hover:text-foreground focus-visible:outline-2 focus-visible:outline-ring"
                      >
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true" className="w-2">
                          {sorted === "asc" ? "\u25b2" : sorted === "desc" ? "\u25bc" : ""}
                        </span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {visible.length === 0 ? (
              <tr>
                <td colSpan={columns.length} className="px-2 py-3 text-center text-muted-foreground">
                  No levels match the filters.
                </td>
              </tr>
            ) : (
              visible.map((row) => (
                <tr
                  key={row.id}
                  className={cn("border-t border-border", isTachyonicState(row.original) && "bg-danger-soft/60")}
                  data-tachyon={isTachyonicState(row.original) ? "true" : undefined}
                >
                  {row.getVisibleCells().map((cell) => (
                    <td key={cell.id} className={cn("px-2 py-1 font-mono whitespace-nowrap", cell.column.id === "sector" ? "text-left font-sans" : "text-right")}>
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              ))
            )}
          </tbody>
        </table>
      </div>
      {notes.length > 0 ? (
        <ul className="list-disc pl-4 text-[11px] text-muted-foreground">
          {notes.map((note) => (
            <li key={note}>{note}</li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
