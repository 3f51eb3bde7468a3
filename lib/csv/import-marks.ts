/**
 * CSV import of many column marks at once: preview with row-level errors, then one transaction
 * that creates every mark — or none unless the user skips the bad rows — and keeps the file.
 */
import { getDb } from "@/db/client";
import { recordAudit } from "@/lib/audit";
import { insertLoadImport, setImportedCount } from "@/db/queries/load-imports";
import { insertMark } from "@/db/queries/marks";
import type { CsvImport } from "@/lib/validation/csv";
import type { UnitSystem } from "@/lib/validation/project";
import { parseMarksCsv, type ParsedMarkRow } from "./parse-marks-csv";

export interface MarkImportReport {
  mode: "preview" | "commit";
  committed: boolean;
  importId: string | null;
  units: UnitSystem;
  columns: string[];
  rows: Array<Omit<ParsedMarkRow, "mark">>;
  fileErrors: string[];
  rowsWithErrors: number;
  validRows: number;
  imported: number;
  skipped: number;
}

export async function importMarksCsv(
  scope: { projectId: string; workspaceId: string; userId: string; units: UnitSystem; defaultCover: number; existing: Array<{ label: string; level: string }> },
  request: CsvImport,
): Promise<MarkImportReport> {
  const units = request.units ?? scope.units;
  const parsed = parseMarksCsv(request.content, { units, defaultCover: scope.defaultCover, existing: scope.existing });
  const rowsWithErrors = parsed.rows.filter((r) => r.errors.length > 0).length;
  const validRows = parsed.rows.length - rowsWithErrors;
  const report: MarkImportReport = {
    mode: request.mode,
    committed: false,
    importId: null,
    units,
    columns: parsed.columns,
    rows: parsed.rows.map(({ row, cells, errors }) => ({ row, cells, errors })),
    fileErrors: parsed.fileErrors,
    rowsWithErrors,
    validRows,
    imported: 0,
    skipped: 0,
  };
  if (request.mode === "preview" || parsed.fileErrors.length > 0 || (rowsWithErrors > 0 && !request.skipInvalid) || validRows === 0) return report;
  const marks = parsed.rows.flatMap((r) => (r.mark ? [r.mark] : []));
  const importId = await getDb().transaction(async (tx) => {
    const record = await insertLoadImport(tx, {
      projectId: scope.projectId,
      markId: null,
      kind: "marks",
      filename: request.filename,
      content: request.content,
      rowsImported: 0,
      rowsSkipped: rowsWithErrors,
      createdBy: scope.userId,
    });
    const created = [];
    for (const m of marks) created.push(await insertMark(tx, scope.projectId, m));
    await setImportedCount(tx, record.id, created.length);
    await recordAudit(
      { workspaceId: scope.workspaceId, userId: scope.userId, action: "import", entity: "column_mark", entityId: record.id, after: { filename: request.filename, marks: created.map((c) => c.id), rowsSkipped: rowsWithErrors } },
      tx,
    );
    return record.id;
  });
  return { ...report, committed: true, importId, imported: marks.length, skipped: rowsWithErrors };
}
