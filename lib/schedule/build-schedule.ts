/**
 * The project's column schedule (product.md flow steps 8–9): one row per column mark with the
 * design it carries, its live check (utilization, verdict, governing combination), quantities and
 * cost per column and extended by the number of identical columns, the latest approved
 * alternative with its stale flag, and totals by cost category and by level.
 *
 * Every mark's design is checked live with the engine and the latest price book, so the schedule
 * always matches what is stored. Figures are rounded once per column (0.01 yd³, 0.1 lb, 0.1 ft²,
 * $0.01) and extended from the rounded figure, so every total is exactly the sum of its rows.
 */
import type { AlternativeRow } from "@/db/queries/alternatives";
import { fingerprintMark } from "@/lib/search-request";
import { CAUTION, CODE_EDITION } from "@/lib/caution";
import type { Confinement, Shape } from "@/engine";
import { checkStoredDesign } from "./check-stored-design";
import { describeBars, describeDesign } from "./describe-design";
import { designCandidateId } from "./design-candidate-id";
import { readProjectMarks } from "./read-project-marks";

export interface ScheduleQuantities {
  /** concrete, yd³ */
  concreteYd3: number;
  /** reinforcing steel (longitudinal, ties, cross-ties), lb */
  steelLb: number;
  /** formwork contact area, ft² */
  formFt2: number;
}

/** $ by cost category (column-checks.md §6). */
export interface ScheduleCost {
  concrete: number;
  steel: number;
  formwork: number;
  bracing: number;
  total: number;
}

export interface ScheduleAdoption {
  alternativeId: string;
  status: AlternativeRow["status"];
  candidateId: string;
  decidedAt: string | null;
  /** the mark's loads, member data, project settings or price book changed since it was checked */
  stale: boolean;
  /** the mark still carries this alternative's design */
  matchesDesign: boolean;
}

export interface ScheduleRow {
  markId: string;
  label: string;
  level: string;
  /** number of identical columns */
  quantity: number;
  /** e.g. "18×22 in, 8 #8, f'c 5 ksi, fy 60 ksi, tied, no brace" */
  design: string;
  shape: Shape;
  /** in; null for circles */
  b: number | null;
  h: number | null;
  /** in; null for rectangles */
  D: number | null;
  /** ksi */
  fc: number;
  fy: number;
  confinement: Confinement;
  /** e.g. "8 #8" */
  bars: string;
  barCount: number | null;
  braceLevels: number;
  /** member utilization; null when it cannot be computed (no loads, unstable, invalid design) */
  utilization: number | null;
  pass: boolean;
  governing: string | null;
  /** the reasons of a failing or unchecked design, in words */
  reasons: string[];
  quantities: { perColumn: ScheduleQuantities; extended: ScheduleQuantities } | null;
  /** null when the project has no price book */
  cost: { perColumn: ScheduleCost; extended: ScheduleCost } | null;
  adoption: ScheduleAdoption | null;
}

export interface ScheduleTotals extends ScheduleQuantities {
  marks: number;
  columns: number;
  /** marks whose design fails or could not be checked */
  notPassing: number;
  cost: ScheduleCost;
}

export interface Schedule {
  project: { id: string; name: string; codeBasis: string; units: string };
  rows: ScheduleRow[];
  totals: {
    /** extended $ by category over the whole project */
    byCategory: ScheduleCost;
    byLevel: Array<ScheduleTotals & { level: string }>;
    grand: ScheduleTotals;
    /** marks left out of the cost totals because the project has no price book */
    unpricedMarks: number;
  };
  priceBookRevision: number | null;
  codeEdition: string;
  caution: string;
  /** US customary units throughout (the engine's units) */
  units: { length: "in"; concrete: "yd3"; steel: "lb"; formwork: "ft2"; cost: "$" };
  generatedAt: string;
}

const round = (v: number, step: number) => Math.round(v / step) * step;
const r2 = (v: number) => Number(round(v, 0.01).toFixed(2));
const r1 = (v: number) => Number(round(v, 0.1).toFixed(1));

function zeroCost(): ScheduleCost {
  return { concrete: 0, steel: 0, formwork: 0, bracing: 0, total: 0 };
}

function zeroTotals(): ScheduleTotals {
  return { marks: 0, columns: 0, notPassing: 0, concreteYd3: 0, steelLb: 0, formFt2: 0, cost: zeroCost() };
}

function addRow(t: ScheduleTotals, row: ScheduleRow): void {
  t.marks += 1;
  t.columns += row.quantity;
  if (!row.pass) t.notPassing += 1;
  if (row.quantities) {
    t.concreteYd3 = r2(t.concreteYd3 + row.quantities.extended.concreteYd3);
    t.steelLb = r1(t.steelLb + row.quantities.extended.steelLb);
    t.formFt2 = r1(t.formFt2 + row.quantities.extended.formFt2);
  }
  if (row.cost) {
    for (const k of ["concrete", "steel", "formwork", "bracing", "total"] as const) t.cost[k] = r2(t.cost[k] + row.cost.extended[k]);
  }
}

export async function buildSchedule(projectId: string): Promise<Schedule | null> {
  const data = await readProjectMarks(projectId);
  if (!data) return null;
  const rows = data.marks.map(({ inputs, approved }) => scheduleRow(inputs, approved));
  const grand = zeroTotals();
  const levels = new Map<string, ScheduleTotals & { level: string }>();
  for (const row of rows) {
    addRow(grand, row);
    let level = levels.get(row.level);
    if (!level) {
      level = { level: row.level, ...zeroTotals() };
      levels.set(row.level, level);
    }
    addRow(level, row);
  }
  return {
    project: { id: data.project.id, name: data.project.name, codeBasis: data.project.codeBasis, units: data.project.units },
    rows,
    totals: { byCategory: { ...grand.cost }, byLevel: [...levels.values()], grand, unpricedMarks: rows.filter((r) => r.cost === null).length },
    priceBookRevision: data.priceBook?.revision ?? null,
    codeEdition: CODE_EDITION,
    caution: CAUTION,
    units: { length: "in", concrete: "yd3", steel: "lb", formwork: "ft2", cost: "$" },
    generatedAt: new Date().toISOString(),
  };
}

function scheduleRow(inputs: Parameters<typeof checkStoredDesign>[0], approved: AlternativeRow | null): ScheduleRow {
  const mark = inputs.mark;
  const check = checkStoredDesign(inputs);
  const s = check.design.section;
  const n = mark.quantity;
  const perQ = check.quantities ? { concreteYd3: r2(check.quantities.concreteYd3), steelLb: r1(check.quantities.steelLb), formFt2: r1(check.quantities.formFt2) } : null;
  let cost: ScheduleRow["cost"] = null;
  if (check.cost) {
    const b = check.cost.breakdown;
    const per = { concrete: r2(b.concrete), steel: r2(b.steel), formwork: r2(b.formwork), bracing: r2(b.bracing), total: 0 };
    per.total = r2(per.concrete + per.steel + per.formwork + per.bracing);
    const ext = { concrete: r2(per.concrete * n), steel: r2(per.steel * n), formwork: r2(per.formwork * n), bracing: r2(per.bracing * n), total: 0 };
    ext.total = r2(ext.concrete + ext.steel + ext.formwork + ext.bracing);
    cost = { perColumn: per, extended: ext };
  }
  const reasons = check.output ? check.output.reasons : check.problem ? [check.problem] : [];
  const currentHash = fingerprintMark(inputs);
  const designId = designCandidateId(check.design);
  return {
    markId: mark.id,
    label: mark.label,
    level: mark.level,
    quantity: n,
    design: describeDesign(check.section, s, check.design.braceLevels),
    shape: s.shape,
    b: s.shape === "rect" ? (s.b ?? null) : null,
    h: s.shape === "rect" ? (s.h ?? null) : null,
    D: s.shape === "circle" ? (s.D ?? null) : null,
    fc: s.fc,
    fy: s.fy,
    confinement: s.confinement,
    bars: check.section ? describeBars(check.section) : "",
    barCount: check.section ? check.section.bars.length : null,
    braceLevels: check.design.braceLevels,
    utilization: check.output?.utilization ?? null,
    pass: check.output?.pass ?? false,
    governing: check.output?.governing ?? null,
    reasons,
    quantities: perQ ? { perColumn: perQ, extended: { concreteYd3: r2(perQ.concreteYd3 * n), steelLb: r1(perQ.steelLb * n), formFt2: r1(perQ.formFt2 * n) } } : null,
    cost,
    adoption: approved
      ? {
          alternativeId: approved.id,
          status: approved.status,
          candidateId: approved.candidateId,
          decidedAt: approved.decidedAt ? approved.decidedAt.toISOString() : null,
          stale: approved.inputsHash !== currentHash,
          matchesDesign: designId !== null && designId === approved.candidateId,
        }
      : null,
  };
}
