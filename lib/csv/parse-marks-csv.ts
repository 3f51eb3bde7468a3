/**
 * Reads a CSV of column marks (one row per mark) into mark bodies, row by row, with every problem
 * reported by row and column. Lengths are in the project's units (in or mm), strengths in ksi or
 * MPa, converted to the engine's units here.
 *
 * Columns (header row required, case-insensitive, any order; blank = default or absent):
 *   label, level, quantity, lu, lux, luy, kx, ky, braced (braced | sway),
 *   shape (rect | circle), b, h, D, fc, fy, confinement (tied | spiral), cover,
 *   bar_size, nb, nh (perimeter layout) or n (faces of a rectangle, or a circle), brace_levels,
 *   max_b, max_h, max_d, limit_note
 */
import Papa from "papaparse";
import { convertLength, convertStress } from "@/engine/units";
import { markCreateSchema, type MarkCreate } from "@/lib/validation/mark";
import type { UnitSystem } from "@/lib/validation/project";
import type { CsvCellError } from "./parse-load-csv";

export const MARK_CSV_COLUMNS = [
  "label",
  "level",
  "quantity",
  "lu",
  "lux",
  "luy",
  "kx",
  "ky",
  "braced",
  "shape",
  "b",
  "h",
  "D",
  "fc",
  "fy",
  "confinement",
  "cover",
  "bar_size",
  "nb",
  "nh",
  "n",
  "brace_levels",
  "max_b",
  "max_h",
  "max_d",
  "limit_note",
] as const;
type Column = (typeof MARK_CSV_COLUMNS)[number];

const REQUIRED: Column[] = ["label", "lu", "shape", "fc", "fy", "bar_size"];

const PATH_TO_COLUMN: Record<string, Column> = {
  label: "label",
  level: "level",
  quantity: "quantity",
  "member.lu": "lu",
  "member.lux": "lux",
  "member.luy": "luy",
  "member.kx": "kx",
  "member.ky": "ky",
  "member.braced": "braced",
  "design.section.shape": "shape",
  "design.section.b": "b",
  "design.section.h": "h",
  "design.section.D": "D",
  "design.section.fc": "fc",
  "design.section.fy": "fy",
  "design.section.confinement": "confinement",
  "design.section.cover": "cover",
  "design.section.layout.size": "bar_size",
  "design.section.layout.nb": "nb",
  "design.section.layout.nh": "nh",
  "design.section.layout.n": "n",
  "design.section.layout.type": "n",
  "design.braceLevels": "brace_levels",
  "limits.maxB": "max_b",
  "limits.maxH": "max_h",
  "limits.maxD": "max_d",
  "limits.note": "limit_note",
};

export interface ParsedMarkRow {
  row: number;
  cells: Record<string, string>;
  mark: MarkCreate | null;
  errors: CsvCellError[];
}

export interface ParsedMarkCsv {
  columns: string[];
  rows: ParsedMarkRow[];
  fileErrors: string[];
}

export function parseMarksCsv(content: string, options: { units: UnitSystem; defaultCover: number; existing: Array<{ label: string; level: string }> }): ParsedMarkCsv {
  const parsed = Papa.parse<string[]>(content.replace(/^\uFEFF/, ""), { skipEmptyLines: "greedy" });
  const [header, ...data] = parsed.data;
  if (!header || header.length === 0) return { columns: [], rows: [], fileErrors: ["the file is empty: the first line must name the columns"] };
  const columns = header.map((h) => h.trim());
  const fileErrors: string[] = [];
  const index = new Map<Column, number>();
  columns.forEach((h, i) => {
    const c = MARK_CSV_COLUMNS.find((k) => k.toLowerCase() === h.toLowerCase());
    if (!c) fileErrors.push(`unknown column "${h}" (expected ${MARK_CSV_COLUMNS.join(", ")})`);
    else if (index.has(c)) fileErrors.push(`column "${h}" appears twice`);
    else index.set(c, i);
  });
  for (const c of REQUIRED) if (!index.has(c)) fileErrors.push(`missing column "${c}"`);
  if (data.length === 0 && fileErrors.length === 0) fileErrors.push("the file has a header but no rows");
  if (fileErrors.length > 0) return { columns, rows: [], fileErrors };

  const L = (v: number) => (options.units === "SI" ? convertLength(v, "US") : v);
  const S = (v: number) => (options.units === "SI" ? convertStress(v, "US") : v);
  const taken = new Set(options.existing.map((m) => `${m.label}\u0000${m.level}`));
  const inFile = new Map<string, number>();

  const rows = data.map((cellsRaw, i): ParsedMarkRow => {
    const row = i + 1;
    const errors: CsvCellError[] = [];
    const cells: Record<string, string> = {};
    columns.forEach((h, j) => (cells[h] = (cellsRaw[j] ?? "").trim()));
    const text = (c: Column) => {
      const j = index.get(c);
      return j === undefined ? "" : (cellsRaw[j] ?? "").trim();
    };
    const num = (c: Column, convert: (v: number) => number = (v) => v): number | undefined => {
      const raw = text(c);
      if (raw === "") return undefined;
      const v = Number(raw.replace(/,/g, ""));
      if (!Number.isFinite(v)) {
        errors.push({ row, column: c, message: `"${raw}" is not a number` });
        return undefined;
      }
      return convert(v);
    };
    const bracedRaw = text("braced").toLowerCase();
    let braced = true;
    if (["sway", "no", "false", "unbraced"].includes(bracedRaw)) braced = false;
    else if (!["", "braced", "yes", "true", "nonsway"].includes(bracedRaw)) errors.push({ row, column: "braced", message: `"${text("braced")}" is not braced or sway` });
    const shape = text("shape").toLowerCase() === "circle" || text("shape").toLowerCase() === "round" ? "circle" : text("shape").toLowerCase() === "rect" || text("shape").toLowerCase() === "rectangular" ? "rect" : null;
    if (!shape) errors.push({ row, column: "shape", message: `"${text("shape")}" is not rect or circle` });
    const size = text("bar_size");
    const nb = num("nb");
    const nh = num("nh");
    const n = num("n");
    const layout =
      shape === "circle"
        ? { type: "circle" as const, size, n: n ?? Number.NaN }
        : n !== undefined && nb === undefined && nh === undefined
          ? { type: "faces" as const, size, n }
          : { type: "perimeter" as const, size, nb: nb ?? Number.NaN, nh: nh ?? Number.NaN };
    const body = {
      label: text("label"),
      level: text("level"),
      quantity: num("quantity") ?? 1,
      member: {
        lu: num("lu", L) ?? Number.NaN,
        ...(num("lux", L) !== undefined ? { lux: num("lux", L) } : {}),
        ...(num("luy", L) !== undefined ? { luy: num("luy", L) } : {}),
        kx: num("kx") ?? 1,
        ky: num("ky") ?? 1,
        braced,
      },
      limits: {
        ...(num("max_b", L) !== undefined ? { maxB: num("max_b", L) } : {}),
        ...(num("max_h", L) !== undefined ? { maxH: num("max_h", L) } : {}),
        ...(num("max_d", L) !== undefined ? { maxD: num("max_d", L) } : {}),
        ...(text("limit_note") ? { note: text("limit_note") } : {}),
      },
      design: {
        section: {
          shape: shape ?? "rect",
          ...(shape === "circle" ? { D: num("D", L) } : { b: num("b", L), h: num("h", L) }),
          fc: num("fc", S) ?? Number.NaN,
          fy: num("fy", S) ?? Number.NaN,
          confinement: text("confinement").toLowerCase() === "spiral" ? "spiral" : "tied",
          cover: num("cover", L) ?? options.defaultCover,
          layout,
        },
        braceLevels: num("brace_levels") ?? 0,
      },
    };
    let mark: MarkCreate | null = null;
    if (errors.length === 0) {
      const result = markCreateSchema.safeParse(body);
      if (!result.success) {
        for (const issue of result.error.issues) {
          const path = issue.path.map(String).join(".");
          errors.push({ row, column: PATH_TO_COLUMN[path] ?? path, message: issue.message });
        }
      } else mark = result.data;
    }
    const key = `${body.label}\u0000${body.level}`;
    if (body.label) {
      if (taken.has(key)) errors.push({ row, column: "label", message: `mark ${body.label}${body.level ? ` at ${body.level}` : ""} already exists in this project` });
      const first = inFile.get(key);
      if (first !== undefined) errors.push({ row, column: "label", message: `repeats row ${first}` });
      else inFile.set(key, row);
    }
    return { row, cells, mark: errors.length === 0 ? mark : null, errors };
  });
  return { columns, rows, fileErrors };
}
