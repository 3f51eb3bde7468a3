/**
 * Reads a CSV of load combinations (one row per combination, as a frame analysis exports them)
 * into contract load cases, row by row, with every problem reported by row and column so the
 * preview can show it beside the cell. Values are in the project's units (US: kip, kip-in; SI:
 * kN, kN·m) and are converted to the engine's units here, at the edge.
 *
 * Columns (header row required, case-insensitive, any order):
 *   mark, level            which column mark (project-wide imports; optional in a mark's import)
 *   combination            the load combination's name
 *   Pu                     factored axial load, compression positive
 *   Mx_M1, Mx_M2, Mx_curvature   end moments about x (magnitudes, M1 ≤ M2), single | double
 *   My_M1, My_M2, My_curvature   the same about y (optional)
 *   betaDns                sustained fraction (optional, 0 when blank)
 *   Mx_M1s, Mx_M2s, My_M1s, My_M2s   sway parts (sway columns only, optional)
 */
import Papa from "papaparse";
import { convertLoadCase } from "@/engine/units";
import type { LoadCase } from "@/engine/types";
import { loadCaseSchema, swayPartIssues } from "@/lib/validation/load-combination";
import type { UnitSystem } from "@/lib/validation/project";

export interface CsvCellError {
  /** 1-based data row (the header is row 0) */
  row: number;
  /** the column's header as written in the file, or our canonical name */
  column: string;
  message: string;
}

export interface ParsedLoadRow {
  row: number;
  mark: string | null;
  level: string | null;
  /** in kip and kip-in; null when the row has errors */
  load: LoadCase | null;
  /** the row's cells as written, for the preview */
  cells: Record<string, string>;
  errors: CsvCellError[];
}

export interface ParsedLoadCsv {
  columns: string[];
  rows: ParsedLoadRow[];
  /** problems with the file as a whole (missing header columns, unreadable file) */
  fileErrors: string[];
}

export const LOAD_CSV_COLUMNS = [
  "mark",
  "level",
  "combination",
  "Pu",
  "Mx_M1",
  "Mx_M2",
  "Mx_curvature",
  "My_M1",
  "My_M2",
  "My_curvature",
  "betaDns",
  "Mx_M1s",
  "Mx_M2s",
  "My_M1s",
  "My_M2s",
] as const;
type Column = (typeof LOAD_CSV_COLUMNS)[number];

const ALIASES: Record<string, Column> = {
  name: "combination",
  combo: "combination",
  load_combination: "combination",
  beta_dns: "betaDns",
  betadns: "betaDns",
  "βdns": "betaDns",
  sustained: "betaDns",
};

const REQUIRED: Column[] = ["combination", "Pu", "Mx_M1", "Mx_M2", "Mx_curvature"];

function canonical(header: string): Column | null {
  const h = header.trim();
  const direct = LOAD_CSV_COLUMNS.find((c) => c.toLowerCase() === h.toLowerCase());
  if (direct) return direct;
  return ALIASES[h.toLowerCase()] ?? null;
}

/** Where a schema path lands in the file: "Mx.M1" → Mx_M1. */
function columnOfPath(path: string): string {
  if (path === "name") return "combination";
  const m = /^(Mx|My)\.(M1s|M2s|M1|M2|curvature)$/.exec(path);
  if (m) return `${m[1]}_${m[2]}`;
  if (path === "Mx" || path === "My") return `${path}_M2`;
  return path || "row";
}

function unitOf(column: Column, units: UnitSystem): string {
  if (column === "Pu") return units === "SI" ? "kN" : "kip";
  if (/^M[xy]_M[12]s?$/.test(column)) return units === "SI" ? "kN·m" : "kip-in";
  return "";
}

/** Column headers with the unit for the given system, for templates and the preview. */
export function loadCsvHeader(units: UnitSystem, withMark: boolean): string[] {
  return LOAD_CSV_COLUMNS.filter((c) => withMark || (c !== "mark" && c !== "level")).map((c) => {
    const u = unitOf(c, units);
    return u ? `${c} (${u})` : c;
  });
}

export function unitOfLoadColumn(column: string, units: UnitSystem): string {
  const c = canonical(column);
  return c ? unitOf(c, units) : "";
}

function readCurvature(raw: string): "single" | "double" | null {
  const v = raw.trim().toLowerCase();
  if (v === "single" || v === "s") return "single";
  if (v === "double" || v === "d") return "double";
  return null;
}

export interface ParseLoadCsvOptions {
  units: UnitSystem;
  /** braced marks take no sway parts; by mark label for project-wide imports */
  isBraced: (mark: string | null, level: string | null) => boolean;
  /** require a mark column (project-wide import) */
  requireMark: boolean;
}

export function parseLoadCsv(content: string, options: ParseLoadCsvOptions): ParsedLoadCsv {
  const parsed = Papa.parse<string[]>(content.replace(/^\uFEFF/, ""), { skipEmptyLines: "greedy" });
  const fileErrors: string[] = [];
  const [header, ...data] = parsed.data;
  if (!header || header.length === 0) return { columns: [], rows: [], fileErrors: ["the file is empty: the first line must name the columns"] };

  const columns = header.map((h) => h.trim());
  const index = new Map<Column, number>();
  columns.forEach((h, i) => {
    const c = canonical(h);
    if (c === null) fileErrors.push(`unknown column "${h}" (expected ${LOAD_CSV_COLUMNS.join(", ")})`);
    else if (index.has(c)) fileErrors.push(`column "${h}" appears twice`);
    else index.set(c, i);
  });
  const required = options.requireMark ? (["mark", ...REQUIRED] as Column[]) : REQUIRED;
  for (const c of required) if (!index.has(c)) fileErrors.push(`missing column "${c}"`);
  if (data.length === 0 && fileErrors.length === 0) fileErrors.push("the file has a header but no rows");
  if (fileErrors.length > 0) return { columns, rows: [], fileErrors };

  const seen = new Map<string, number>();
  const rows: ParsedLoadRow[] = data.map((cellsRaw, i) => {
    const row = i + 1;
    const errors: CsvCellError[] = [];
    const cells: Record<string, string> = {};
    columns.forEach((h, j) => (cells[h] = (cellsRaw[j] ?? "").trim()));
    if (cellsRaw.length !== columns.length) {
      errors.push({ row, column: "row", message: `has ${cellsRaw.length} cells; the header has ${columns.length}` });
    }
    const text = (c: Column): string => {
      const j = index.get(c);
      return j === undefined ? "" : (cellsRaw[j] ?? "").trim();
    };
    const num = (c: Column, required: boolean): number | undefined => {
      const raw = text(c);
      if (raw === "") {
        if (required) errors.push({ row, column: c, message: "is empty: a number is needed" });
        return undefined;
      }
      const v = Number(raw.replace(/,/g, ""));
      if (!Number.isFinite(v)) {
        errors.push({ row, column: c, message: `"${raw}" is not a number` });
        return undefined;
      }
      return v;
    };
    const mark = index.has("mark") ? text("mark") || null : null;
    const level = index.has("level") ? text("level") || null : null;
    if (options.requireMark && !mark) errors.push({ row, column: "mark", message: "is empty: which column mark is this row for?" });

    const name = text("combination");
    const Pu = num("Pu", true);
    const axis = (prefix: "Mx" | "My", required: boolean) => {
      const M1 = num(`${prefix}_M1`, required);
      const M2 = num(`${prefix}_M2`, required);
      const curvRaw = text(`${prefix}_curvature`);
      const M1s = num(`${prefix}_M1s`, false);
      const M2s = num(`${prefix}_M2s`, false);
      const any = M1 !== undefined || M2 !== undefined || curvRaw !== "" || M1s !== undefined || M2s !== undefined;
      if (!required && !any) return undefined;
      let curvature: "single" | "double" | null = readCurvature(curvRaw);
      if (curvature === null) {
        errors.push({ row, column: `${prefix}_curvature`, message: curvRaw === "" ? "is empty: single or double" : `"${curvRaw}" is not single or double` });
        curvature = "single";
      }
      return { M1: M1 ?? 0, M2: M2 ?? 0, curvature, ...(M1s !== undefined ? { M1s } : {}), ...(M2s !== undefined ? { M2s } : {}) };
    };
    const Mx = axis("Mx", true);
    const My = axis("My", false);
    const betaDns = num("betaDns", false) ?? 0;

    let load: LoadCase | null = null;
    if (errors.length === 0 && Mx) {
      const given: LoadCase = { name, Pu: Pu ?? 0, betaDns, Mx, ...(My ? { My } : {}) };
      // Negative magnitudes or M1 > M2 are checked before conversion so messages quote the file's numbers.
      const check = loadCaseSchema.safeParse(given);
      if (!check.success) {
        for (const issue of check.error.issues) {
          errors.push({ row, column: columnOfPath(issue.path.map(String).join(".")), message: issue.message });
        }
      } else {
        for (const issue of swayPartIssues(check.data, options.isBraced(mark, level))) {
          errors.push({ row, column: columnOfPath(issue.path), message: issue.message });
        }
        load = options.units === "SI" ? convertLoadCase(check.data, "US") : check.data;
      }
    }
    const key = `${mark ?? ""}\u0000${level ?? ""}\u0000${name}`;
    if (name !== "") {
      const first = seen.get(key);
      if (first !== undefined) errors.push({ row, column: "combination", message: `"${name}" repeats row ${first}${mark ? ` for mark ${mark}` : ""}` });
      else seen.set(key, row);
    }
    return { row, mark, level, load: errors.length === 0 ? load : null, cells, errors };
  });
  return { columns, rows, fileErrors };
}
