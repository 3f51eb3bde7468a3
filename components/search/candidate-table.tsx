"use client";
/**
 * The passing candidates of a search (TanStack Table): sortable by every column, filtered by
 * shape, f'c, bar size, brace levels and a steel-ratio range, paged, with a checkbox per row to
 * put up to four candidates side by side. Every control is a native button, select, input or
 * checkbox, so the table works from the keyboard.
 */
import { useId, useMemo, useState } from "react";
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  type ColumnFiltersState,
  type FilterFn,
  type SortingState,
  useReactTable,
} from "@tanstack/react-table";
import { formatNumber, formatQuantity, type UnitSystem } from "@/components/projects/units";
import type { CandidateRow } from "./search-types";
import { describeBars, describeOutline, formatCarbon, formatDollars } from "./candidate-format";

export const MAX_COMPARED = 4;

export interface CandidateTableProps {
  candidates: CandidateRow[];
  units: UnitSystem;
  bestId: string | null;
  selected: string[];
  onToggle: (id: string) => void;
}

const equalsText: FilterFn<CandidateRow> = (row, columnId, value) => value === "" || value === undefined || String(row.getValue(columnId)) === String(value);
const inRange: FilterFn<CandidateRow> = (row, columnId, value) => {
  const [lo, hi] = (value ?? [undefined, undefined]) as [number | undefined, number | undefined];
  const v = Number(row.getValue(columnId));
  if (!Number.isFinite(v)) return lo === undefined && hi === undefined;
  return (lo === undefined || v >= lo - 1e-12) && (hi === undefined || v <= hi + 1e-12);
};

const col = createColumnHelper<CandidateRow>();

function distinct<T extends string | number>(values: Array<T | undefined>): T[] {
  return [...new Set(values.filter((v): v is T => v !== undefined))].sort((a, b) => (typeof a === "number" && typeof b === "number" ? a - b : String(a).localeCompare(String(b), "en", { numeric: true })));
}

export function CandidateTable({ candidates, units, bestId, selected, onToggle }: CandidateTableProps) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "cost", desc: false }]);
  const [filters, setFilters] = useState<ColumnFiltersState>([]);
  const [pagination, setPagination] = useState({ pageIndex: 0, pageSize: 25 });
  const fid = useId();
  const full = selected.length >= MAX_COMPARED;

  const columns = useMemo(
    () => [
      col.display({
        id: "compare",
        header: () => <span className="sr-only">Compare</span>,
        cell: ({ row }) => {
          const on = selected.includes(row.original.id);
          return (
            <input
              type="checkbox"
              aria-label={`Compare ${row.original.id}`}
              checked={on}
              disabled={!on && full}
              onChange={() => onToggle(row.original.id)}
            />
          );
        },
      }),
      col.accessor("id", {
        header: "Candidate",
        cell: (c) => (
          <span className="font-mono text-xs">
            {c.getValue()}
            {c.getValue() === bestId ? <span className="ml-1 rounded bg-sound-600 px-1 font-sans text-[10px] font-semibold text-white">cheapest</span> : null}
          </span>
        ),
      }),
      col.accessor("shape", { header: "Shape", filterFn: equalsText, cell: (c) => (c.getValue() === "circle" ? "circular" : "rectangular") }),
      col.accessor((r) => (r.shape === "circle" ? (r.D ?? 0) : (r.b ?? 0) * (r.h ?? 0)), {
        id: "outline",
        header: "Outline",
        cell: (c) => describeOutline(c.row.original, units),
      }),
      col.accessor((r) => r.fc, { id: "fc", header: `f′c (${units === "SI" ? "MPa" : "ksi"})`, filterFn: equalsText, cell: (c) => formatQuantity(c.getValue() ?? null, "stress", units).replace(/ (ksi|MPa)$/, "") }),
      col.accessor((r) => r.bars?.size, { id: "size", header: "Bars", filterFn: equalsText, sortingFn: (a, b) => (a.original.bars?.count ?? 0) - (b.original.bars?.count ?? 0), cell: (c) => describeBars(c.row.original) }),
      col.accessor((r) => r.braceLevels ?? 0, { id: "braceLevels", header: "Brace levels", filterFn: equalsText }),
      col.accessor((r) => r.rho, { id: "rho", header: "ρ", filterFn: inRange, cell: (c) => formatNumber(c.getValue() ?? null, 4) }),
      col.accessor("utilization", { header: "Utilization", cell: (c) => formatNumber(c.getValue(), 3) }),
      col.accessor("cost", { header: "Cost ($/column)", cell: (c) => formatDollars(c.getValue(), 2) }),
      col.accessor("carbon", { header: "Carbon (kgCO2e/column)", cell: (c) => formatCarbon(c.getValue()).replace(" kgCO2e", "") }),
      col.accessor("onFront", { header: "On the front", cell: (c) => (c.getValue() ? "yes" : "—") }),
    ],
    [units, bestId, selected, full, onToggle],
  );

  const table = useReactTable({
    data: candidates,
    columns,
    state: { sorting, columnFilters: filters, pagination },
    onSortingChange: setSorting,
    onColumnFiltersChange: (u) => {
      setFilters(u);
      setPagination((p) => ({ ...p, pageIndex: 0 }));
    },
    onPaginationChange: setPagination,
    getRowId: (r) => r.id,
    // Every column sorts ascending first (lowest cost, lowest utilization), numbers included.
    sortDescFirst: false,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
  });

  const filterValue = (id: string) => filters.find((f) => f.id === id)?.value;
  const setFilter = (id: string, value: unknown) =>
    table.getColumn(id)?.setFilterValue(value === "" || (Array.isArray(value) && value.every((v) => v === undefined)) ? undefined : value);
  const rhoRange = (filterValue("rho") as [number | undefined, number | undefined] | undefined) ?? [undefined, undefined];
  const options = {
    shape: distinct(candidates.map((c) => c.shape)),
    fc: distinct(candidates.map((c) => c.fc)),
    size: distinct(candidates.map((c) => c.bars?.size)),
    braceLevels: distinct(candidates.map((c) => c.braceLevels ?? 0)),
  };
  const select = (id: keyof typeof options, label: string, show: (v: string | number) => string) => (
    <div>
      <label htmlFor={`${fid}-${id}`} className="field-label">
        {label}
      </label>
      <select id={`${fid}-${id}`} className="field-input" value={String(filterValue(id) ?? "")} onChange={(e) => setFilter(id, e.target.value)}>
        <option value="">all</option>
        {options[id].map((v) => (
          <option key={String(v)} value={String(v)}>
            {show(v)}
          </option>
        ))}
      </select>
    </div>
  );
  const rhoInput = (i: 0 | 1, label: string) => (
    <div>
      <label htmlFor={`${fid}-rho-${i}`} className="field-label">
        {label}
      </label>
      <input
        id={`${fid}-rho-${i}`}
        type="number"
        step="0.001"
        min={0}
        max={0.08}
        inputMode="decimal"
        className="field-input"
        value={rhoRange[i] ?? ""}
        onChange={(e) => {
          const raw = e.target.value.trim();
          const n = raw === "" ? undefined : Number(raw);
          const next: [number | undefined, number | undefined] = [...rhoRange];
          next[i] = n !== undefined && Number.isFinite(n) ? n : undefined;
          setFilter("rho", next);
        }}
      />
    </div>
  );
  const shown = table.getFilteredRowModel().rows.length;
  const page = table.getState().pagination;

  return (
    <div className="space-y-3">
      <fieldset className="grid gap-3 sm:grid-cols-3 lg:grid-cols-6" aria-label="Filter the candidates">
        {select("shape", "Shape", (v) => (v === "circle" ? "circular" : "rectangular"))}
        {select("fc", `f′c (${units === "SI" ? "MPa" : "ksi"})`, (v) => formatQuantity(Number(v), "stress", units))}
        {select("size", "Bar size", (v) => String(v))}
        {select("braceLevels", "Brace levels", (v) => String(v))}
        {rhoInput(0, "Steel ratio ρ from")}
        {rhoInput(1, "Steel ratio ρ to")}
      </fieldset>
      <p className="text-sm text-ink-700" aria-live="polite" data-testid="candidate-count">
        {shown} of {candidates.length} passing candidates shown · {selected.length} of {MAX_COMPARED} chosen for comparison
        {filters.length > 0 ? (
          <button type="button" className="ml-3 text-oxide-700 underline" onClick={() => setFilters([])}>
            clear filters
          </button>
        ) : null}
      </p>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm" data-testid="candidate-table">
          <thead>
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id} className="border-b border-stone-200 text-left text-ink-500">
                {hg.headers.map((h) => {
                  const sorted = h.column.getIsSorted();
                  return (
                    <th key={h.id} scope="col" className="whitespace-nowrap py-1 pr-3 font-medium" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : h.column.getCanSort() ? "none" : undefined}>
                      {h.column.getCanSort() ? (
                        <button type="button" className="inline-flex items-center gap-1 hover:text-ink-900" onClick={h.column.getToggleSortingHandler()}>
                          {flexRender(h.column.columnDef.header, h.getContext())}
                          <span aria-hidden>{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                        </button>
                      ) : (
                        flexRender(h.column.columnDef.header, h.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className={`border-b border-stone-100 ${selected.includes(row.id) ? "bg-stone-50" : ""}`} data-testid="candidate-row" data-candidate={row.id}>
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="whitespace-nowrap py-1 pr-3 tabular-nums">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {shown === 0 ? <p className="py-3 text-sm text-ink-700">No candidate matches these filters.</p> : null}
      </div>
      {table.getPageCount() > 1 ? (
        <nav aria-label="Candidate pages" className="flex items-center gap-2 text-sm">
          <button type="button" className="btn-quiet" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
            Previous
          </button>
          <span>
            page {page.pageIndex + 1} of {table.getPageCount()}
          </span>
          <button type="button" className="btn-quiet" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
            Next
          </button>
        </nav>
      ) : null}
    </div>
  );
}
