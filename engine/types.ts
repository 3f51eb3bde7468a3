/**
 * Shared engine types. Units inside the engine are US customary throughout:
 * kip, in, ksi, kip-in, kip-in² (see ../shared/reference/column-checks.md).
 * The shapes mirror the CLI / API JSON contract so one object flows from the
 * request, through the engine, to the response.
 */

export type UsBarSize = "#3" | "#4" | "#5" | "#6" | "#7" | "#8" | "#9" | "#10" | "#11" | "#14" | "#18";
export type MetricBarSize = "10" | "13" | "16" | "19" | "22" | "25" | "29" | "32" | "36" | "43" | "57";
export type BarSize = UsBarSize | MetricBarSize;

export type Shape = "rect" | "circle";
export type Confinement = "tied" | "spiral";
export type Axis = "x" | "y";
export type Curvature = "single" | "double";
export type EiOption = "a" | "b" | "c";

/** A bar given by its centre (in, origin at the section centroid) and size. */
export interface BarInput {
  x: number;
  y: number;
  size: BarSize;
}

export type LayoutInput =
  | { type: "perimeter"; size: BarSize; nb: number; nh: number }
  | { type: "faces"; size: BarSize; n: number }
  | { type: "circle"; size: BarSize; n: number };

export interface TieInput {
  size: BarSize;
  /** centre-to-centre spacing (ties) or pitch (spiral), in */
  spacing: number;
}

/** Section as given by the user (contract `section`). Either `bars` or `layout`. */
export interface SectionInput {
  shape: Shape;
  /** width, in: the depth for bending about y */
  b?: number;
  /** depth, in: the depth for bending about x (Mx compresses the +y face) */
  h?: number;
  /** diameter, in (circle) */
  D?: number;
  fc: number;
  fy: number;
  confinement: Confinement;
  /** clear cover to the ties / spiral, in */
  cover: number;
  bars?: BarInput[];
  layout?: LayoutInput;
  tie?: TieInput;
}

/** A bar after resolution: area (in²) and diameter (in) looked up. */
export interface ResolvedBar {
  x: number;
  y: number;
  size: BarSize;
  area: number;
  db: number;
}

/**
 * A section ready for strength calculations. Produced by `resolveSection`.
 * Geometry is precomputed once so the hot loops (interaction, member check)
 * do no table look-ups.
 */
export interface ResolvedSection {
  shape: Shape;
  /** extent along x, in (b for rect, D for circle) */
  b: number;
  /** extent along y, in (h for rect, D for circle) */
  h: number;
  /** diameter for circles, in; 0 for rectangles */
  D: number;
  fc: number;
  fy: number;
  confinement: Confinement;
  cover: number;
  /** transverse reinforcement: size, bar diameter, and spacing (derived or given) */
  tie: { size: BarSize; db: number; spacing: number; given: boolean };
  bars: ResolvedBar[];
  Ag: number;
  Ast: number;
  rho: number;
  /** gross moment of inertia about the x axis (bending about x), in⁴ */
  Igx: number;
  Igy: number;
  /** moment of inertia of the reinforcement about the centroidal x / y axes, in⁴ */
  Isex: number;
  Isey: number;
  Ec: number;
  Es: number;
  beta1: number;
  /** P0 = 0.85 f'c (Ag − Ast) + fy Ast, kip (22.4.2.2) */
  P0: number;
  /** Pn,max = 0.80 P0 tied / 0.85 P0 spiral, kip (Table 22.4.2.1) */
  PnMax: number;
  /** φ Pn,max, kip */
  phiPnMax: number;
  /** pure tension Pnt = fy Ast, kip (22.4.3.1) */
  Pnt: number;
}

/** One point of an interaction diagram (contract `diagram.points`). */
export interface DiagramPoint {
  c: number;
  Pn: number;
  Mn: number;
  phi: number;
  phiPn: number;
  phiMn: number;
  epsT: number;
}

export interface DiagramResult {
  P0: number;
  phiPnMax: number;
  points: DiagramPoint[];
}

/** Design moment strength at a given axial load (from `phiMnAt`). */
export interface MomentCapacity {
  /** φ Mn at Pu, kip-in (≥ 0) */
  phiMn: number;
  Mn: number;
  phi: number;
  /** neutral-axis depth, in */
  c: number;
  /** net tensile strain in the extreme tension layer (positive = tension) */
  epsT: number;
}

export interface EndMoments {
  /** smaller end moment magnitude, kip-in */
  M1: number;
  /** larger end moment magnitude, kip-in */
  M2: number;
  curvature: Curvature;
  /** sway parts (6.6.4.6), magnitudes at the same ends as M1 / M2 */
  M1s?: number;
  M2s?: number;
}

export interface LoadCase {
  name: string;
  Pu: number;
  betaDns: number;
  Mx: EndMoments;
  My?: EndMoments;
}

export type SwayAxisData = { Q: number } | { sumPu: number; sumPc: number };

export interface MemberInput {
  /** clear height, in */
  lu: number;
  lux?: number;
  luy?: number;
  kx: number;
  ky: number;
  braced: boolean;
  braceLevels?: number;
  transverseLoad?: boolean | { x?: boolean; y?: boolean };
  sway?: { x?: SwayAxisData; y?: SwayAxisData };
  /** pour height for quantities, in (defaults to lu) */
  pourHeight?: number;
}

export interface CheckOptions {
  ei?: EiOption;
  /** maximum aggregate size, in */
  dagg?: number;
  rhoMax?: number;
  /** exposure for the cover rule */
  exposure?: "interior" | "exposed" | "earth";
  /** radius of gyration: "approx" 0.30h / 0.25D (default) or "gross" √(Ig/Ag) (6.2.5.2) */
  radius?: "approx" | "gross";
  /** units in which reason texts quote numbers (the numbers in the output are converted at the edge) */
  displayUnits?: "US" | "SI";
  /** also report Bresler's reciprocal-load φPn beside each governing biaxial check (comparison only) */
  bresler?: boolean;
}

export interface Prices {
  /** $/yd³ in place, keyed by f'c in ksi as a string ("4", "5", ...) */
  concrete: Record<string, number>;
  /** $/lb placed */
  steel: number;
  /** $/ft² contact area, flat forms */
  formwork: number;
  /** $/ft² contact area, round forms */
  roundFormwork: number;
  /** $ per brace level */
  brace: number;
}

export interface CarbonFactors {
  /** kgCO2e/yd³ keyed by f'c in ksi */
  concrete: Record<string, number>;
  /** kgCO2e/lb */
  steel: number;
}

export interface CheckInput {
  section: SectionInput;
  member: MemberInput;
  options?: CheckOptions;
  loads: LoadCase[];
  prices?: Prices;
  carbon?: CarbonFactors;
}

export interface DetailingResult {
  rule: string;
  clause: string;
  ok: boolean;
  value: number;
  limit: number;
  message?: string;
  /** unit of `value` and `limit`: "in" for lengths (converted for SI output), "" for ratios and counts */
  unit?: string;
}

export interface AxisResult {
  klur: number;
  limit: number;
  slender: boolean;
  EI: number | null;
  Pc: number | null;
  Cm: number | null;
  delta: number | null;
  /** first-order moment actually used (after M2,min), kip-in */
  M2: number;
  Mc: number;
  phiMn: number;
  ratio: number | null;
  /** sway magnifier δs (6.6.4.6), present for sway columns; null when the story is unstable */
  deltaS?: number | null;
}

export interface BiaxialResult {
  Mcx: number;
  Mcy: number;
  phiMn: number;
  ratio: number;
  /** direction of the resultant moment vector, degrees */
  theta: number;
  /** Bresler reciprocal-load comparison value, kip (for comparison only) */
  bresler?: number | null;
}

export interface CaseResult {
  name: string;
  Pu: number;
  /** null = infinite (unstable, over the 1.4 cap, or Pu > φPn,max) */
  utilization: number | null;
  pass: boolean;
  reasons: string[];
  x: AxisResult;
  y: AxisResult;
  biaxial: BiaxialResult | null;
  segment: number;
  /** the axis whose first-order moment was raised to M2,min in the governing check (§7.1), else null */
  m2min?: Axis | null;
}

export interface Quantities {
  concreteYd3: number;
  steelLb: number;
  formFt2: number;
  ties: number;
  crossTies: number;
}

export interface CostBreakdown {
  concrete: number;
  steel: number;
  formwork: number;
  bracing: number;
}

export interface CheckOutput {
  pass: boolean;
  utilization: number | null;
  governing: string | null;
  section: {
    Ag: number;
    Ast: number;
    rho: number;
    P0: number;
    phiPnMax: number;
    bars: ResolvedBar[];
    detailing: DetailingResult[];
  };
  cases: CaseResult[];
  quantities: Quantities;
  cost?: { total: number; breakdown: CostBreakdown; lines: CostLine[] };
  carbon?: { total: number; concrete: number; steel: number };
  reasons: string[];
  assumptions: {
    code: "ACI 318-19";
    ei: EiOption;
    braced: boolean;
    kx: number;
    ky: number;
    caution: string;
    /** units of the numbers in this output (absent = US) */
    units?: "US" | "SI";
    /** further assumptions in words (radius of gyration, βdns, sway along-length k, ...) */
    notes?: string[];
  };
}

/** One traceable line of a cost breakdown. */
export interface CostLine {
  category: keyof CostBreakdown;
  item: string;
  quantity: number;
  unit: string;
  unitPrice: number;
  amount: number;
}
