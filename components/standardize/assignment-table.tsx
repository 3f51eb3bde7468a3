"use client";
/** The marks' candidates for one N: which outline each mark takes and what it costs against its own cheapest. */
import { createColumnHelper, flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import { useState } from "react";
import type { AssignmentEntry } from "./use-standardization";

const money = (v: number) => `$${v.toLocaleString("en-US", { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`;
const column = createColumnHelper<AssignmentEntry>();

const columns = [
  column.accessor("label", { header: "Mark" }),
  column.accessor((r) => r.level ?? "", { id: "level", header: "Level" }),
  column.accessor("quantity", { header: "Columns" }),
  column.accessor("outline", { header: "Outline" }),
  column.accessor("candidateId", { header: "Alternative", cell: (c) => <span className="font-mono text-xs">{c.getValue()}</span> }),
  column.accessor("fc", { header: "f'c (ksi)" }),
  column.accessor("utilization", { header: "Utilization", cell: (c) => c.getValue().toFixed(3) }),
  column.accessor("cost", { header: "Cost per column", cell: (c) => money(c.getValue()) }),
  column.accessor((r) => r.cost - r.ownCheapestCost, { id: "premium", header: "Premium over own cheapest", cell: (c) => money(c.getValue()) }),
  column.accessor("extended", { header: "Extended", cell: (c) => money(c.getValue()) }),
];

export interface AssignmentTableProps {
  rows: AssignmentEntry[];
}

export function AssignmentTable({ rows }: AssignmentTableProps) {
  const [sorting, setSorting] = useState<SortingState>([]);
  const table = useReactTable({ data: rows, columns, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel() });
  return (
    <div className="overflow-x-auto">
      <table className="min-w-full text-sm">
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id} className="border-b border-stone-200 text-left text-ink-500">
              {group.headers.map((header) => (
                <th key={header.id} className="px-2 py-2 font-medium" aria-sort={header.column.getIsSorted() === "asc" ? "ascending" : header.column.getIsSorted() === "desc" ? "descending" : "none"}>
                  <button type="button" className="hover:underline" onClick={header.column.getToggleSortingHandler()}>
                    {flexRender(header.column.columnDef.header, header.getContext())}
                    {header.column.getIsSorted() === "asc" ? " ▲" : header.column.getIsSorted() === "desc" ? " ▼" : ""}
                  </button>
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-stone-100">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-2 py-1.5 tabular-nums">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
