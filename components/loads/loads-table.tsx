"use client";
/**
 * The mark's load combinations as an editable table (TanStack Table). Typing goes into the row;
 * a row is validated with the shared schema and saved when the person presses Enter or leaves it
 * (new rows POST, edited rows PUT with their version; a stale version shows what changed).
 * Keys: Enter saves and moves down, ↑/↓ move between rows, Esc undoes the row's edits.
 */
import { useEffect, useMemo, useRef, useState } from "react";
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable } from "@tanstack/react-table";
import { ApiError, callApi } from "@/components/projects/api";
import { formatQuantity, unitLabel, type UnitSystem } from "@/components/projects/units";
import type { LoadRecord } from "@/components/marks/mark-types";
import { EMPTY_CELLS, LOAD_COLUMNS, cellsOf, isBlank, parseRow, type Cells, type LoadColumnKey } from "./load-row-model";

export interface LoadsTableProps {
  markId: string;
  loads: LoadRecord[];
  units: UnitSystem;
  braced: boolean;
  canEdit: boolean;
  /** called after any row is saved or deleted, so the check and the mark refresh */
  onChanged: () => void;
}

interface Row {
  key: string;
  record: LoadRecord | null;
  cells: Cells;
  errors: Partial<Record<LoadColumnKey | "row", string>>;
  status: "saved" | "dirty" | "saving" | "conflict" | "new";
  current?: LoadRecord;
}

let newKey = 0;
const blankRow = (): Row => ({ key: `new-${++newKey}`, record: null, cells: { ...EMPTY_CELLS }, errors: {}, status: "new" });

function rowsFrom(loads: LoadRecord[], units: UnitSystem): Row[] {
  return [...loads.map((l) => ({ key: l.id, record: l, cells: cellsOf(l, units), errors: {}, status: "saved" as const })), blankRow()];
}

const helper = createColumnHelper<Row>();

export function LoadsTable({ markId, loads, units, braced, canEdit, onChanged }: LoadsTableProps) {
  const [rows, setRows] = useState<Row[]>(() => rowsFrom(loads, units));
  const rowsRef = useRef(rows);
  rowsRef.current = rows;
  const tableRef = useRef<HTMLTableElement>(null);

  // Server data changed (import, another tab): take it, keeping rows still being edited here.
  const signature = loads.map((l) => `${l.id}:${l.version}`).join("|") + units;
  useEffect(() => {
    setRows((prev) => {
      const editing = prev.filter((r) => r.status === "dirty" || r.status === "conflict" || (r.status === "new" && !isBlank(r.cells)));
      const fresh = loads.map((l) => {
        const mine = editing.find((e) => e.record?.id === l.id);
        return mine && mine.record?.version === l.version ? mine : { key: l.id, record: l, cells: cellsOf(l, units), errors: {}, status: "saved" as const };
      });
      const pendingNew = editing.filter((e) => e.record === null);
      return [...fresh, ...(pendingNew.length > 0 ? pendingNew : []), blankRow()];
    });
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [signature]);

  const visibleColumns = useMemo(() => LOAD_COLUMNS.filter((c) => !("sway" in c) || !braced), [braced]);

  const setCell = (key: string, col: LoadColumnKey, value: string) =>
    setRows((prev) => {
      const next = prev.map((r) => (r.key === key ? { ...r, cells: { ...r.cells, [col]: value }, status: r.status === "new" ? ("new" as const) : ("dirty" as const) } : r));
      const last = next[next.length - 1];
      return last && !isBlank(last.cells) ? [...next, blankRow()] : next;
    });

  async function saveRow(key: string): Promise<boolean> {
    const row = rowsRef.current.find((r) => r.key === key);
    if (!row || row.status === "saved" || row.status === "saving") return true;
    if (row.status === "new" && isBlank(row.cells)) return true;
    const { load, errors } = parseRow(row.cells, units, braced);
    if (!load) {
      setRows((prev) => prev.map((r) => (r.key === key ? { ...r, errors } : r)));
      return false;
    }
    setRows((prev) => prev.map((r) => (r.key === key ? { ...r, errors: {}, status: "saving" } : r)));
    try {
      const res = row.record
        ? await callApi<{ load: LoadRecord }>(`/api/marks/${markId}/loads/${row.record.id}`, { method: "PUT", body: { ...load, position: row.record.position, version: row.record.version } })
        : await callApi<{ load: LoadRecord }>(`/api/marks/${markId}/loads`, { method: "POST", body: load });
      setRows((prev) => prev.map((r) => (r.key === key ? { key: r.key, record: res.load, cells: cellsOf(res.load, units), errors: {}, status: "saved" } : r)));
      onChanged();
      return true;
    } catch (error) {
      if (error instanceof ApiError && error.status === 409) {
        setRows((prev) => prev.map((r) => (r.key === key ? { ...r, status: "conflict", current: error.current as LoadRecord, errors: { row: error.message } } : r)));
      } else {
        const fieldErrors: Row["errors"] = {};
        if (error instanceof ApiError) for (const i of error.issues) fieldErrors[(LOAD_COLUMNS.some((c) => c.key === i.path) ? i.path : "row") as LoadColumnKey] = i.message;
        if (Object.keys(fieldErrors).length === 0) fieldErrors.row = error instanceof Error ? error.message : "not saved";
        setRows((prev) => prev.map((r) => (r.key === key ? { ...r, status: r.record ? "dirty" : "new", errors: fieldErrors } : r)));
      }
      return false;
    }
  }

  async function deleteRow(row: Row) {
    if (!row.record) {
      setRows((prev) => prev.filter((r) => r.key !== row.key));
      return;
    }
    try {
      await callApi(`/api/marks/${markId}/loads/${row.record.id}?version=${row.record.version}`, { method: "DELETE" });
      setRows((prev) => prev.filter((r) => r.key !== row.key));
      onChanged();
    } catch (error) {
      setRows((prev) => prev.map((r) => (r.key === row.key ? { ...r, errors: { row: error instanceof Error ? error.message : "not deleted" }, ...(error instanceof ApiError && error.status === 409 ? { status: "conflict" as const, current: error.current as LoadRecord } : {}) } : r)));
    }
  }

  function takeCurrent(row: Row) {
    if (!row.current) return;
    const current = row.current;
    setRows((prev) => prev.map((r) => (r.key === row.key ? { key: r.key, record: current, cells: cellsOf(current, units), errors: {}, status: "saved" } : r)));
  }

  function focusCell(rowIndex: number, col: string) {
    const el = tableRef.current?.querySelector<HTMLElement>(`[data-row="${rowIndex}"][data-col="${col}"]`);
    el?.focus();
    if (el instanceof HTMLInputElement) el.select();
  }

  function onKey(e: React.KeyboardEvent, rowIndex: number, row: Row, col: LoadColumnKey) {
    if (e.key === "Enter") {
      e.preventDefault();
      void saveRow(row.key).then((ok) => {
        if (ok) focusCell(rowIndex + 1, col);
      });
    } else if (e.key === "ArrowDown" && !(e.target instanceof HTMLSelectElement)) {
      e.preventDefault();
      focusCell(rowIndex + 1, col);
    } else if (e.key === "ArrowUp" && !(e.target instanceof HTMLSelectElement)) {
      e.preventDefault();
      focusCell(rowIndex - 1, col);
    } else if (e.key === "Escape") {
      e.preventDefault();
      setRows((prev) => prev.map((r) => (r.key === row.key ? (r.record ? { ...r, cells: cellsOf(r.record, units), errors: {}, status: "saved" } : { ...r, cells: { ...EMPTY_CELLS }, errors: {}, status: "new" }) : r)));
    }
  }

  const columns = useMemo(
    () => [
      ...visibleColumns.map((c) =>
        helper.display({
          id: c.key,
          header: () => {
            const u = unitLabel(c.quantity, units);
            return (
              <span>
                {c.label}
                {u ? <span className="block text-xs font-normal text-ink-500">{u}</span> : null}
              </span>
            );
          },
          cell: (ctx) => {
            const row = ctx.row.original;
            const rowIndex = ctx.row.index;
            const error = row.errors[c.key];
            const label = `${c.label}${unitLabel(c.quantity, units) ? ` (${unitLabel(c.quantity, units)})` : ""}, row ${rowIndex + 1}`;
            const common = {
              "data-row": rowIndex,
              "data-col": c.key,
              "aria-label": label,
              "aria-invalid": error ? true : undefined,
              disabled: !canEdit,
              onKeyDown: (e: React.KeyboardEvent) => onKey(e, rowIndex, row, c.key),
            };
            return (
              <div>
                {c.kind === "curvature" ? (
                  <select {...common} className="w-full rounded border border-stone-300 bg-white px-1 py-1 text-sm" value={row.cells[c.key]} onChange={(e) => setCell(row.key, c.key, e.target.value)}>
                    <option value="single">single</option>
                    <option value="double">double</option>
                  </select>
                ) : (
                  <input
                    {...common}
                    type="text"
                    inputMode={c.kind === "number" ? "decimal" : "text"}
                    className={`w-full rounded border px-1 py-1 text-sm ${c.kind === "number" ? "text-right tabular-nums" : ""} ${error ? "border-strained-600 bg-stone-50" : "border-stone-300 bg-white"}`}
                    value={row.cells[c.key]}
                    placeholder={row.status === "new" && c.key === "name" ? "new combination" : undefined}
                    onChange={(e) => setCell(row.key, c.key, e.target.value)}
                  />
                )}
                {error ? <p className="mt-0.5 text-xs leading-tight text-strained-600">{error}</p> : null}
              </div>
            );
          },
        }),
      ),
      helper.display({
        id: "status",
        header: () => <span className="sr-only">Row status</span>,
        cell: (ctx) => {
          const row = ctx.row.original;
          return (
            <div className="flex items-center gap-2 text-xs">
              <span data-testid="row-status" className={row.status === "conflict" ? "text-strained-600" : "text-ink-500"}>
                {row.status === "saved" ? "saved" : row.status === "saving" ? "saving…" : row.status === "conflict" ? "changed elsewhere" : row.status === "dirty" ? "not saved" : ""}
              </span>
              {canEdit && row.status !== "new" ? (
                <button type="button" className="text-strained-600 underline" onClick={() => void deleteRow(row)} aria-label={`Delete ${row.cells.name || "row"}`}>
                  delete
                </button>
              ) : null}
            </div>
          );
        },
      }),
    ],
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [visibleColumns, units, canEdit, braced, markId],
  );

  const table = useReactTable({ data: rows, columns, getCoreRowModel: getCoreRowModel(), getRowId: (r) => r.key });

  return (
    <div className="overflow-x-auto">
      <table ref={tableRef} className="w-full min-w-[68rem] border-collapse text-sm" aria-label="Load combinations">
        <thead>
          {table.getHeaderGroups().map((g) => (
            <tr key={g.id} className="border-b border-stone-200 text-left align-bottom text-ink-700">
              {g.headers.map((h) => (
                <th key={h.id} scope="col" className="px-1 py-1 font-medium">
                  {flexRender(h.column.columnDef.header, h.getContext())}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((r) => {
            const row = r.original;
            return (
              <FragmentRow key={r.id} colSpan={visibleColumns.length + 1} row={row} onTakeCurrent={() => takeCurrent(row)} units={units}>
                <tr
                  className={`border-b border-stone-100 align-top ${row.status === "conflict" ? "bg-stone-50" : ""}`}
                  data-testid={row.record ? `load-row-${row.cells.name}` : "load-row-new"}
                  onBlur={(e) => {
                    if (!e.currentTarget.contains(e.relatedTarget as Node | null)) void saveRow(row.key);
                  }}
                >
                  {r.getVisibleCells().map((cell) => (
                    <td key={cell.id} className="px-1 py-1">
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              </FragmentRow>
            );
          })}
        </tbody>
      </table>
      {canEdit ? <p className="mt-2 text-xs text-ink-500">Type in the last row to add a combination. Enter saves the row and moves down; ↑/↓ move between rows; Esc undoes a row&apos;s edits.</p> : null}
    </div>
  );
}

function FragmentRow({ children, row, colSpan, onTakeCurrent, units }: { children: React.ReactNode; row: Row; colSpan: number; onTakeCurrent: () => void; units: UnitSystem }) {
  const message = row.errors.row;
  return (
    <>
      {children}
      {message || row.status === "conflict" ? (
        <tr>
          <td colSpan={colSpan} className="px-1 pb-2">
            <div role="alert" className="text-xs text-strained-600">
              {message}
              {row.status === "conflict" && row.current ? (
                <>
                  {" "}
                  Now stored: Pu {formatQuantity(row.current.Pu, "force", units)}, Mx M2 {formatQuantity(row.current.Mx.M2, "moment", units)}
                  {row.current.My ? `, My M2 ${formatQuantity(row.current.My.M2, "moment", units)}` : ""}, βdns {row.current.betaDns}.{" "}
                  <button type="button" className="underline" onClick={onTakeCurrent}>
                    Take the stored values
                  </button>
                </>
              ) : null}
            </div>
          </td>
        </tr>
      ) : null}
    </>
  );
}
