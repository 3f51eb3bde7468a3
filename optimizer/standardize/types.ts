/**
 * Shapes of project-wide standardization: choose at most N distinct section outlines for the
 * whole project (so column forms are reused from pour to pour) and give every mark one passing
 * candidate whose outline is among them, at the least total cost.
 *
 * Candidates are the optimizer's front entries as they are (cli-contract.md § optimize: `id`,
 * `shape`, `b`, `h` or `D`, `fc`, `cost`, `utilization`, …); fields this module does not read are
 * carried through untouched to the assignment.
 */

/** One passing alternative of a mark (a front entry of `optimize`, or any object with these fields). */
export interface StandardizeCandidate {
  id: string;
  shape: "rect" | "circle";
  /** rectangle width, in (or mm); the depth for bending about y */
  b?: number;
  /** rectangle depth for bending about x */
  h?: number;
  /** circle diameter */
  D?: number;
  /** specified concrete strength f'c (ksi or MPa), compared exactly */
  fc: number;
  /** cost of one column in the price book's currency */
  cost: number;
  /** governing demand / capacity ratio; a candidate passes when it is ≤ 1 */
  utilization: number;
  /** when present and false the candidate is not used (a failing alternative) */
  pass?: boolean;
}

export interface StandardizeMark<C extends StandardizeCandidate = StandardizeCandidate> {
  id: string;
  label: string;
  /** the floor the mark's columns are poured on; needed only for `oneFcPerLevel` */
  level?: string;
  /** number of identical columns of this mark (a positive whole number) */
  quantity: number;
  candidates: readonly C[];
}

export interface StandardizeInput<C extends StandardizeCandidate = StandardizeCandidate> {
  marks: readonly StandardizeMark<C>[];
  /** the most distinct outlines the project may use (a whole number ≥ 1) */
  maxOutlines: number;
  /** cost of one form set, charged once per distinct outline used (price book `formSet`) */
  formSetCost: number;
  /** require every mark on one level to use the same f'c (marks without a level are free) */
  oneFcPerLevel?: boolean;
  /**
   * Whether an 18×22 and a 22×18 rectangle share one form set (turned a quarter turn). Default
   * true: a rectangular form set is four panels that serve either orientation (common practice).
   * With false, b×h and h×b are different outlines.
   */
  rotatedShareForms?: boolean;
}

/** One distinct outline of the chosen set. */
export interface StandardizeOutline {
  /** `r{b}x{h}` (with rotatedShareForms the smaller side first) or `c{D}` */
  key: string;
  shape: "rect" | "circle";
  b?: number;
  h?: number;
  D?: number;
  /** ids of the marks that use it */
  marks: string[];
  /** number of columns poured in it (Σ quantity of those marks) */
  columns: number;
  formSetCost: number;
}

export interface StandardizeAssignmentEntry<C extends StandardizeCandidate = StandardizeCandidate> {
  markId: string;
  label: string;
  level: string | null;
  candidateId: string;
  outline: string;
  fc: number;
  utilization: number;
  /** cost of one column */
  cost: number;
  quantity: number;
  /** cost × quantity, rounded to cents */
  extended: number;
  /** the mark's own cheapest passing candidate (any outline), for comparison */
  ownCheapestCost: number;
  /** the candidate object as given */
  candidate: C;
}

export type StandardizeMethod =
  /** javascript-lp-solver's branch and bound on the reduced model */
  | "integer-program"
  /** bounds alone proved the heuristic assignment optimal (no branching needed) */
  | "bound"
  /** the exact combinatorial branch and bound (used when the integer program does not finish) */
  | "branch-and-bound"
  /** nothing to solve (infeasible before any model was built) */
  | "none";

export interface StandardizeStats {
  method: StandardizeMethod;
  /** wall time of this solve, ms */
  ms: number;
  /** distinct outlines among the marks' passing candidates */
  outlines: number;
  /** outlines left in the integer program after bound-based fixing */
  outlinesInModel: number;
  /** candidates after keeping the cheapest per outline (and per f'c with oneFcPerLevel) */
  options: number;
  /** integer-program size (0 when no model was solved) */
  variables: number;
  constraints: number;
  /** a proven lower bound on the total cost (equal to totalCost when optimal) */
  lowerBound: number | null;
  /** true when the assignment is proven optimal (false only when a time limit was reached) */
  optimal: boolean;
  /** branch-and-bound nodes of the fallback (0 when it did not run) */
  nodes: number;
}

export interface StandardizeResult<C extends StandardizeCandidate = StandardizeCandidate> {
  feasible: boolean;
  maxOutlines: number;
  /** columnsCost + formSetsCost (null when infeasible) */
  totalCost: number | null;
  /** Σ extended */
  columnsCost: number | null;
  /** formSetCost × number of outlines used */
  formSetsCost: number | null;
  outlines: StandardizeOutline[];
  /** in the order of the input marks */
  assignment: StandardizeAssignmentEntry<C>[];
  /** the f'c chosen for each level (only with oneFcPerLevel) */
  levelFc: Array<{ level: string; fc: number }>;
  /** why no assignment exists (empty when feasible) */
  reasons: string[];
  /** the fewest distinct outlines any assignment needs (null when unknown or impossible) */
  minOutlines: number | null;
  /** what the result takes for granted (shown with it; it supports, never replaces, an engineer's judgement) */
  assumptions: string[];
  stats: StandardizeStats;
}
