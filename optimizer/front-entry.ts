/**
 * A front entry (cli-contract.md § optimize, `front[]`): the candidate, its cost with the
 * breakdown, quantities, carbon, utilization and governing load case.
 */
import { checkResolved, computeCarbon, computeCost, KG_PER_LB, M2_PER_FT2, M3_PER_YD3, resolveSection } from "../engine";
import type { BarSize, CheckOutput, Confinement, MemberInput } from "../engine/types";
import type { CandidateTable, Family, SearchProblem, Valued } from "./search-space";
import { candidateIdOf, quantitiesOf, sectionInputOf } from "./search-space";

export interface FrontEntry {
  id: string;
  shape: "rect" | "circle";
  /** rectangles: width and depth; circles: diameter (in, or mm for SI requests) */
  b?: number;
  h?: number;
  D?: number;
  fc: number;
  fy: number;
  confinement: Confinement;
  bars: {
    size: BarSize;
    count: number;
    layout: { type: "perimeter"; nb: number; nh: number } | { type: "circle"; n: number };
  };
  braceLevels: number;
  /** currency, rounded to cents */
  cost: number;
  /** kgCO2e, rounded to 0.01 */
  carbon: number;
  costBreakdown: { concrete: number; steel: number; formwork: number; bracing: number };
  /** yd³, lb, ft² (m³, kg, m² for SI requests) */
  quantities: { concreteYd3: number; steelLb: number; formFt2: number };
  /** rounded to 1e-4 (the precision fronts compare, column-checks.md §7.12) */
  utilization: number;
  governing: string;
  /** longitudinal steel ratio Ast/Ag */
  rho: number;
}

const cents = (x: number) => Math.round(x * 100) / 100;
const r4 = (x: number) => Math.round(x * 1e4) / 1e4;

/** The engine check of candidate i with prices and carbon (engine units). */
export function checkCandidate(problem: SearchProblem, table: CandidateTable, i: number): CheckOutput {
  const fam = table.families[table.family[i] as number] as Family;
  const fc = (problem.fcs[table.fc[i] as number] as Valued).v;
  const section = resolveSection(sectionInputOf(problem, { ...fam, fy: fam.fy.v }, fam.layouts[table.layout[i] as number] as [number, number], fc));
  const member: MemberInput = { ...problem.member, braceLevels: problem.braceLevels[table.brace[i] as number] as number };
  return checkResolved(section, member, problem.loads, problem.options, { prices: problem.prices, carbon: problem.carbon });
}

/**
 * Builds the contract entry of candidate i. Utilization and governing case are the search's
 * evaluation of it (the engine's caseUtilization over every load case: the numbers its member
 * check reports); cost and carbon come from the engine's computeCost / computeCarbon on the
 * candidate's quantities (identical to computeQuantities, see search-space.ts).
 */
export function buildFrontEntry(problem: SearchProblem, table: CandidateTable, i: number, evaluated: { utilization: number; governing: string }): FrontEntry {
  const fam = table.families[table.family[i] as number] as Family;
  const li = table.layout[i] as number;
  const fi = table.fc[i] as number;
  const [a, b] = fam.layouts[li] as [number, number];
  const si = problem.units === "SI";
  const fcV = problem.fcs[fi] as Valued;
  const braceLevels = problem.braceLevels[table.brace[i] as number] as number;
  const q = quantitiesOf(problem, fam, li, fi);
  const detail = { ...q, ties: 0, crossTies: 0, L: 0, concreteIn3: 0, lap: 0, hoopLength: 0, crossTieLength: 0 };
  const cost = computeCost(detail, fcV.v, braceLevels, problem.prices);
  const carbon = computeCarbon(detail, fcV.v, problem.carbon);
  const count = fam.counts[li] as number;
  const Ag = fam.shape === "rect" ? fam.b * fam.h : (Math.PI * fam.D * fam.D) / 4;
  let Ast = 0;
  for (let k = 0; k < count; k++) Ast += fam.area;
  const entry: FrontEntry = {
    id: candidateIdOf(problem, table, i),
    shape: fam.shape,
    ...(fam.shape === "rect" ? { b: fam.bDisp, h: fam.hDisp } : { D: fam.DDisp }),
    fc: fcV.disp,
    fy: fam.fy.disp,
    confinement: fam.confinement,
    bars: {
      size: fam.size,
      count,
      layout: fam.shape === "rect" ? { type: "perimeter", nb: a, nh: b } : { type: "circle", n: a },
    },
    braceLevels,
    cost: cents(cost.total),
    carbon: cents(carbon.total),
    costBreakdown: {
      concrete: cents(cost.breakdown.concrete),
      steel: cents(cost.breakdown.steel),
      formwork: cents(cost.breakdown.formwork),
      bracing: cents(cost.breakdown.bracing),
    },
    quantities: si
      ? { concreteYd3: r4(q.concreteYd3 * M3_PER_YD3), steelLb: r4(q.steelLb * KG_PER_LB), formFt2: r4(q.formFt2 * M2_PER_FT2) }
      : { concreteYd3: r4(q.concreteYd3), steelLb: r4(q.steelLb), formFt2: r4(q.formFt2) },
    utilization: r4(evaluated.utilization),
    governing: evaluated.governing,
    rho: r4(Ast / Ag),
  };
  return entry;
}
