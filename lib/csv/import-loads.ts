/**
 * CSV import of load combinations, for one mark or for many marks from one file. A preview
 * parses and reports every problem by row and column; a commit writes all rows in one
 * transaction — or none when any row is bad, unless the user chose to skip the bad rows — and
 * keeps the original file with the import.
 */
import { getDb } from "@/db/client";
import { recordAudit } from "@/lib/audit";
import { insertLoadImport, setImportedCount } from "@/db/queries/load-imports";
import { writeImportedLoads } from "@/db/queries/load-combinations";
import type { Mark } from "@/db/queries/marks";
import type { LoadCase } from "@/engine/types";
import type { CsvImport } from "@/lib/validation/csv";
import type { UnitSystem } from "@/lib/validation/project";
import { parseLoadCsv, type CsvCellError } from "./parse-load-csv";

export interface LoadImportRow {
  row: number;
  mark: string | null;
  level: string | null;
  markId: string | null;
  cells: Record<string, string>;
  errors: CsvCellError[];
  /** kip, kip-in */
  load: LoadCase | null;
}

export interface LoadImportReport {
  mode: "preview" | "commit";
  committed: boolean;
  importId: string | null;
  units: UnitSystem;
  columns: string[];
  rows: LoadImportRow[];
  fileErrors: string[];
  rowsWithErrors: number;
  validRows: number;
  imported: number;
  skipped: number;
}

export interface LoadImportScope {
  projectId: string;
  workspaceId: string;
  userId: string;
  units: UnitSystem;
  /** the one mark of a mark's import; null for a project-wide file with a mark column */
  mark: Mark | null;
  /** every mark of the project (for resolving the mark column) */
  marks: Mark[];
}

function resolveMark(scope: LoadImportScope, label: string | null, level: string | null): { mark: Mark | null; message: string | null } {
  if (scope.mark) {
    if (label !== null && label !== scope.mark.label) return { mark: null, message: `this row is for mark ${label}; the file is being imported into ${scope.mark.label}` };
    if (level !== null && level !== scope.mark.level) return { mark: null, message: `this row is for level ${level}; the mark is at ${scope.mark.level || "no level"}` };
    return { mark: scope.mark, message: null };
  }
  if (!label) return { mark: null, message: "is empty: which column mark is this row for?" };
  const same = scope.marks.filter((m) => m.label === label && (level === null || m.level === level));
  if (same.length === 1) return { mark: same[0] ?? null, message: null };
  if (same.length === 0) return { mark: null, message: `no mark ${label}${level ? ` at level ${level}` : ""} in this project (add it first)` };
  return { mark: null, message: `mark ${label} exists at levels ${same.map((m) => m.level || "(none)").join(", ")}: add a level column` };
}

/** Parse, resolve marks, and (in commit mode) write. Throws nothing for bad rows: they are data. */
export async function importLoadCsv(scope: LoadImportScope, request: CsvImport): Promise<LoadImportReport> {
  const units = request.units ?? scope.units;
  const resolved = new Map<number, Mark | null>();
  const parsed = parseLoadCsv(request.content, {
    units,
    requireMark: scope.mark === null,
    isBraced: (label, level) => {
      const r = resolveMark(scope, label, level);
      return r.mark ? r.mark.member.braced : true;
    },
  });

  const rows: LoadImportRow[] = parsed.rows.map((r) => {
    const { mark, message } = resolveMark(scope, r.mark, r.level);
    resolved.set(r.row, mark);
    const errors = [...r.errors];
    if (message && !errors.some((e) => e.column === "mark")) errors.unshift({ row: r.row, column: scope.mark ? "mark" : "mark", message });
    return { row: r.row, mark: r.mark, level: r.level, markId: mark?.id ?? null, cells: r.cells, errors, load: errors.length === 0 ? r.load : null };
  });

  const rowsWithErrors = rows.filter((r) => r.errors.length > 0).length;
  const validRows = rows.length - rowsWithErrors;
  const report: LoadImportReport = {
    mode: request.mode,
    committed: false,
    importId: null,
    units,
    columns: parsed.columns,
    rows,
    fileErrors: parsed.fileErrors,
    rowsWithErrors,
    validRows,
    imported: 0,
    skipped: 0,
  };
  const blocked = parsed.fileErrors.length > 0 || (rowsWithErrors > 0 && !request.skipInvalid) || validRows === 0;
  if (request.mode === "preview" || blocked) return report;

  const byMark = new Map<string, LoadCase[]>();
  for (const r of rows) {
    if (!r.load || !r.markId) continue;
    const list = byMark.get(r.markId) ?? [];
    list.push(r.load);
    byMark.set(r.markId, list);
  }
  const { importId, imported } = await getDb().transaction(async (tx) => {
    const record = await insertLoadImport(tx, {
      projectId: scope.projectId,
      markId: scope.mark?.id ?? null,
      kind: scope.mark ? "mark-loads" : "project-loads",
      filename: request.filename,
      content: request.content,
      rowsImported: 0,
      rowsSkipped: rowsWithErrors,
      createdBy: scope.userId,
    });
    const written = await writeImportedLoads(tx, byMark, record.id, request.replace);
    await setImportedCount(tx, record.id, written);
    await recordAudit(
      {
        workspaceId: scope.workspaceId,
        userId: scope.userId,
        action: "import",
        entity: "load_import",
        entityId: record.id,
        after: { filename: request.filename, rowsImported: written, rowsSkipped: rowsWithErrors, replace: request.replace, marks: [...byMark.keys()] },
      },
      tx,
    );
    return { importId: record.id, imported: written };
  });
  return { ...report, committed: true, importId, imported, skipped: rowsWithErrors };
}

/** Issues in the contract's error shape: path "rows.<row>.<column>". */
export function reportIssues(report: LoadImportReport): Array<{ path: string; message: string }> {
  return [
    ...report.fileErrors.map((message) => ({ path: "file", message })),
    ...report.rows.flatMap((r) => r.errors.map((e) => ({ path: `rows.${e.row}.${e.column}`, message: `row ${e.row}, ${e.column}: ${e.message}` }))),
  ];
}
