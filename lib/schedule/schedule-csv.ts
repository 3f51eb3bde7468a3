/**
 * The column schedule as CSV for the detailer and the estimator: a header row with the unit of
 * every numeric column, one row per mark, then a total per level and a project total, then the
 * code edition, price book revision and caution as trailing rows (a CSV has no comment lines,
 * and leading non-header lines would break spreadsheet imports).
 */
import Papa from "papaparse";
import type { Schedule, ScheduleRow, ScheduleTotals } from "./build-schedule";

export const SCHEDULE_CSV_HEADERS = [
  "Mark",
  "Level",
  "Quantity",
  "Design",
  "Shape",
  "b (in)",
  "h (in)",
  "D (in)",
  "f'c (ksi)",
  "fy (ksi)",
  "Confinement",
  "Bars",
  "Brace levels",
  "Utilization",
  "Verdict",
  "Governing combination",
  "Concrete per column (yd³)",
  "Steel per column (lb)",
  "Formwork per column (ft²)",
  "Cost per column ($)",
  "Concrete (yd³)",
  "Steel (lb)",
  "Formwork (ft²)",
  "Cost concrete ($)",
  "Cost steel ($)",
  "Cost formwork ($)",
  "Cost bracing ($)",
  "Cost total ($)",
  "Adopted alternative",
  "Adoption stale",
  "Carries adopted design",
  "Notes",
] as const;

export type ScheduleCsvHeader = (typeof SCHEDULE_CSV_HEADERS)[number];
type CsvRecord = Partial<Record<ScheduleCsvHeader, string | number>>;

function verdictOf(row: ScheduleRow): string {
  if (row.utilization === null && !row.pass && row.governing === null) return "not checked";
  return row.pass ? "passes" : "FAILS";
}

function rowRecord(row: ScheduleRow): CsvRecord {
  return {
    Mark: row.label,
    Level: row.level,
    Quantity: row.quantity,
    Design: row.design,
    Shape: row.shape === "rect" ? "rectangular" : "circular",
    "b (in)": row.b ?? "",
    "h (in)": row.h ?? "",
    "D (in)": row.D ?? "",
    "f'c (ksi)": row.fc,
    "fy (ksi)": row.fy,
    Confinement: row.confinement,
    Bars: row.bars,
    "Brace levels": row.braceLevels,
    Utilization: row.utilization === null ? "" : Number(row.utilization.toFixed(3)),
    Verdict: verdictOf(row),
    "Governing combination": row.governing ?? "",
    "Concrete per column (yd³)": row.quantities?.perColumn.concreteYd3 ?? "",
    "Steel per column (lb)": row.quantities?.perColumn.steelLb ?? "",
    "Formwork per column (ft²)": row.quantities?.perColumn.formFt2 ?? "",
    "Cost per column ($)": row.cost?.perColumn.total ?? "",
    "Concrete (yd³)": row.quantities?.extended.concreteYd3 ?? "",
    "Steel (lb)": row.quantities?.extended.steelLb ?? "",
    "Formwork (ft²)": row.quantities?.extended.formFt2 ?? "",
    "Cost concrete ($)": row.cost?.extended.concrete ?? "",
    "Cost steel ($)": row.cost?.extended.steel ?? "",
    "Cost formwork ($)": row.cost?.extended.formwork ?? "",
    "Cost bracing ($)": row.cost?.extended.bracing ?? "",
    "Cost total ($)": row.cost?.extended.total ?? "",
    "Adopted alternative": row.adoption ? row.adoption.candidateId : "",
    "Adoption stale": row.adoption ? (row.adoption.stale ? "stale" : "current") : "",
    "Carries adopted design": row.adoption ? (row.adoption.matchesDesign ? "yes" : "no: the mark's design was changed after approval") : "",
    Notes: row.pass ? "" : row.reasons.join("; "),
  };
}

function totalRecord(label: string, level: string, t: ScheduleTotals): CsvRecord {
  return {
    Mark: label,
    Level: level,
    Quantity: t.columns,
    Design: `${t.marks} mark${t.marks === 1 ? "" : "s"}${t.notPassing ? `, ${t.notPassing} not passing` : ""}`,
    "Concrete (yd³)": t.concreteYd3,
    "Steel (lb)": t.steelLb,
    "Formwork (ft²)": t.formFt2,
    "Cost concrete ($)": t.cost.concrete,
    "Cost steel ($)": t.cost.steel,
    "Cost formwork ($)": t.cost.formwork,
    "Cost bracing ($)": t.cost.bracing,
    "Cost total ($)": t.cost.total,
  };
}

/** Label of the total rows, in the Mark column. */
export const LEVEL_TOTAL_LABEL = "Total for level";
export const PROJECT_TOTAL_LABEL = "Project total";

export function scheduleToCsv(schedule: Schedule): string {
  const records: CsvRecord[] = schedule.rows.map(rowRecord);
  for (const level of schedule.totals.byLevel) records.push(totalRecord(LEVEL_TOTAL_LABEL, level.level, level));
  records.push(totalRecord(PROJECT_TOTAL_LABEL, "", schedule.totals.grand));
  records.push({ Mark: "Code edition", Level: schedule.codeEdition });
  records.push({ Mark: "Price book revision", Level: schedule.priceBookRevision ?? "none: costs not priced" });
  records.push({ Mark: "Units", Level: "US customary (in, ksi, yd³, lb, ft², $)" });
  records.push({ Mark: "Generated", Level: schedule.generatedAt });
  records.push({ Mark: "Caution", Level: schedule.caution });
  const data = records.map((r) => SCHEDULE_CSV_HEADERS.map((h) => r[h] ?? ""));
  return Papa.unparse({ fields: [...SCHEDULE_CSV_HEADERS], data }, { newline: "\r\n", escapeFormulae: true });
}

/** File name for the download: "{project}-column-schedule.csv", reduced to safe characters. */
export function scheduleFileName(projectName: string): string {
  const base = projectName.normalize("NFKD").replace(/[^\w.-]+/g, "-").replace(/-+/g, "-").replace(/^-+|-+$/g, "").slice(0, 80) || "project";
  return `${base}-column-schedule.csv`;
}
