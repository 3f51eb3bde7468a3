"use client";
/**
 * Upload of a load-combination CSV: the file is previewed first, every bad cell shown with its
 * row and column; the import then writes all rows, or none — unless the person ticks "leave out
 * the rows with errors". The file itself is kept with the import.
 */
import { useId, useState } from "react";
import { ApiError, callApi } from "@/components/projects/api";
import { unitLabel, type UnitSystem } from "@/components/projects/units";
import { loadCsvHeader } from "@/lib/csv/parse-load-csv";
import { MARK_CSV_COLUMNS } from "@/lib/csv/parse-marks-csv";

interface ReportRow {
  row: number;
  mark: string | null;
  cells: Record<string, string>;
  errors: Array<{ row: number; column: string; message: string }>;
}

interface Report {
  committed: boolean;
  importId: string | null;
  columns: string[];
  rows: ReportRow[];
  fileErrors: string[];
  rowsWithErrors: number;
  validRows: number;
  imported: number;
  skipped: number;
}

export interface CsvImportProps {
  /** POST endpoint: /api/marks/{id}/loads/import or /api/projects/{id}/loads/import */
  endpoint: string;
  units: UnitSystem;
  /** true for a project-wide file (a mark column names each row's mark) */
  withMark: boolean;
  canImport: boolean;
  onImported: () => void;
  /** what the file holds: load combinations (default) or column marks */
  kind?: "loads" | "marks";
}

export function CsvImport({ endpoint, units, withMark, canImport, onImported, kind = "loads" }: CsvImportProps) {
  const inputId = useId();
  const [file, setFile] = useState<{ name: string; content: string } | null>(null);
  const [report, setReport] = useState<Report | null>(null);
  const [replace, setReplace] = useState(true);
  const [skipInvalid, setSkipInvalid] = useState(false);
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<string | null>(null);

  async function preview(next: { name: string; content: string }) {
    setBusy(true);
    setMessage(null);
    try {
      const res = await callApi<{ report: Report }>(endpoint, { method: "POST", body: { filename: next.name, content: next.content, mode: "preview" } });
      setReport(res.report);
    } catch (error) {
      setReport(null);
      setMessage(error instanceof Error ? error.message : "the file could not be read");
    } finally {
      setBusy(false);
    }
  }

  async function commit() {
    if (!file) return;
    setBusy(true);
    setMessage(null);
    try {
      const res = await callApi<{ report: Report }>(endpoint, { method: "POST", body: { filename: file.name, content: file.content, mode: "commit", replace, skipInvalid } });
      const what = kind === "marks" ? "column mark" : "load combination";
      setMessage(`Imported ${res.report.imported} ${what}${res.report.imported === 1 ? "" : "s"}${res.report.skipped ? `; left out ${res.report.skipped} row${res.report.skipped === 1 ? "" : "s"} with errors` : ""}. The file is kept with the import.`);
      setReport(null);
      setFile(null);
      onImported();
    } catch (error) {
      if (error instanceof ApiError && (error.body as { report?: Report })?.report) setReport((error.body as { report: Report }).report);
      setMessage(error instanceof Error ? error.message : "not imported");
    } finally {
      setBusy(false);
    }
  }

  const header = kind === "marks" ? [...MARK_CSV_COLUMNS] : loadCsvHeader(units, withMark);
  const template = header.map((h) => h.replace(/ \(.*\)$/, "")).join(",");
  const title = kind === "marks" ? "Upload column marks (CSV)" : withMark ? "Upload load combinations of several marks (CSV)" : "Upload load combinations (CSV)";
  const errorColumns = (r: ReportRow) => new Set(r.errors.map((e) => e.column));

  return (
    <section className="panel space-y-3" aria-label={kind === "marks" ? "Upload column marks" : withMark ? "Upload the load combinations of several marks" : "Upload load combinations"}>
      <h3 className="font-semibold">{title}</h3>
      {kind === "marks" ? (
        <p className="text-xs text-ink-500">
          First line: <code className="font-mono">{template}</code>. Lengths in {unitLabel("length", units)}, f′c and fy in {unitLabel("stress", units)}; braced or sway; shape rect or circle; nb × nh bars
          around a rectangle (or n on the two faces normal to h), n around a circle. Blank cells take the defaults (k = 1, braced, cover from the project).
        </p>
      ) : (
        <p className="text-xs text-ink-500">
          First line: <code className="font-mono">{template}</code>. Pu in {unitLabel("force", units)}, moments in {unitLabel("moment", units)} as magnitudes with M1 ≤ M2,
          curvature single or double, βdns 0–1 (blank = 0). My and the sway parts (Mx_M1s …) may be left out.
        </p>
      )}
      <div>
        <label htmlFor={inputId} className="field-label">
          CSV file
        </label>
        <input
          id={inputId}
          type="file"
          accept=".csv,text/csv"
          className="mt-1 block text-sm"
          disabled={!canImport && false}
          onChange={async (e) => {
            const f = e.target.files?.[0];
            if (!f) return;
            const next = { name: f.name, content: await f.text() };
            setFile(next);
            setSkipInvalid(false);
            await preview(next);
          }}
        />
      </div>
      {busy ? <p className="text-sm text-ink-500">Working…</p> : null}
      {report ? (
        <div className="space-y-2">
          {report.fileErrors.length > 0 ? (
            <ul role="alert" className="text-sm text-strained-600">
              {report.fileErrors.map((m) => (
                <li key={m}>{m}</li>
              ))}
            </ul>
          ) : (
            <p className="text-sm" data-testid="import-summary">
              {report.validRows} row{report.validRows === 1 ? "" : "s"} ready
              {report.rowsWithErrors > 0 ? (
                <span className="font-semibold text-strained-600">
                  , {report.rowsWithErrors} row{report.rowsWithErrors === 1 ? "" : "s"} with errors
                </span>
              ) : null}
              .
            </p>
          )}
          {report.rows.length > 0 ? (
            <div className="max-h-80 overflow-auto">
              <table className="w-full border-collapse text-xs" aria-label="Preview of the file">
                <thead>
                  <tr className="text-left text-ink-500">
                    <th className="px-1">Row</th>
                    {report.columns.map((c) => (
                      <th key={c} className="px-1 font-medium">
                        {c}
                      </th>
                    ))}
                    <th className="px-1">Problems</th>
                  </tr>
                </thead>
                <tbody>
                  {report.rows.map((r) => {
                    const bad = errorColumns(r);
                    return (
                      <tr key={r.row} className={r.errors.length ? "bg-stone-50" : ""} data-testid={r.errors.length ? "preview-row-error" : "preview-row-ok"}>
                        <td className="px-1 tabular-nums">{r.row}</td>
                        {report.columns.map((c) => (
                          <td key={c} className={`px-1 ${bad.has(c) ? "font-semibold text-strained-600 underline decoration-wavy" : ""}`}>
                            {r.cells[c]}
                          </td>
                        ))}
                        <td className="px-1 text-strained-600">
                          {r.errors.map((e) => (
                            <div key={`${e.column}-${e.message}`}>
                              row {e.row}, {e.column}: {e.message}
                            </div>
                          ))}
                        </td>
                      </tr>
                    );
                  })}
                </tbody>
              </table>
            </div>
          ) : null}
          {canImport && report.fileErrors.length === 0 && report.validRows > 0 ? (
            <div className="space-y-2 text-sm">
              <fieldset className={`flex flex-wrap gap-4 ${kind === "marks" ? "hidden" : ""}`}>
                <legend className="sr-only">Existing combinations</legend>
                <label className="flex items-center gap-2">
                  <input type="radio" name={`${inputId}-mode`} checked={replace} onChange={() => setReplace(true)} /> Replace the existing combinations of each mark
                </label>
                <label className="flex items-center gap-2">
                  <input type="radio" name={`${inputId}-mode`} checked={!replace} onChange={() => setReplace(false)} /> Add to them
                </label>
              </fieldset>
              {report.rowsWithErrors > 0 ? (
                <label className="flex items-center gap-2">
                  <input type="checkbox" checked={skipInvalid} onChange={(e) => setSkipInvalid(e.target.checked)} /> Leave out the {report.rowsWithErrors} row
                  {report.rowsWithErrors === 1 ? "" : "s"} with errors and import the rest
                </label>
              ) : null}
              <button type="button" className="btn-primary" disabled={busy || (report.rowsWithErrors > 0 && !skipInvalid)} onClick={() => void commit()}>
                Import {report.rowsWithErrors > 0 && skipInvalid ? report.validRows : report.rows.length} row{report.rows.length === 1 ? "" : "s"}
              </button>
              {report.rowsWithErrors > 0 && !skipInvalid ? <p className="text-xs text-ink-500">Nothing is imported from a file with errors unless you choose to leave those rows out.</p> : null}
            </div>
          ) : null}
        </div>
      ) : null}
      {message ? (
        <p role="status" className="text-sm">
          {message}
        </p>
      ) : null}
      {!canImport ? <p className="text-xs text-ink-500">Your role may preview a file; owners and engineers import.</p> : null}
    </section>
  );
}
