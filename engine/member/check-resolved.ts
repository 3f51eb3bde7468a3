import { checkDetailing } from "../detailing/check-detailing";
import { breslerReciprocal } from "../interaction";
import { computeCarbon } from "../quantities/compute-carbon";
import { computeCost } from "../quantities/compute-cost";
import { computeQuantities, type QuantityDetail } from "../quantities/compute-quantities";
import type { ChainVariant, MagnifierChain } from "../slenderness/run-magnifier-chain";
import type {
  AxisResult,
  CarbonFactors,
  CaseResult,
  CheckOptions,
  CheckOutput,
  LoadCase,
  MemberInput,
  Prices,
  ResolvedSection,
} from "../types";
import { capacityX, capacityY, createCaseScratch, evaluateCase, runAxis, type CaseScratch } from "./evaluate-case";
import { MPA_PER_KSI } from "../units";
import { formatForce, formatMoment, round3 } from "./format-value";
import { prepareMember, type PreparedMember } from "./prepare-member";

/** Code edition every result is produced under. */
export const CODE_EDITION = "ACI 318-19" as const;

/** The caution carried by every result (product.md, "Cautions shown in the product"). */
export const CAUTION =
  "Caryatid supports, and never replaces, the judgement of a licensed engineer. Local building codes and the engineer of record govern. Checks follow " +
  CODE_EDITION +
  "; every result states the assumptions (EI option, k, braced or sway, βdns) that produced it.";

/** Tolerance on utilization = 1.0 so round-off does not flip a pass (1e-9 relative). */
const PASS_TOL = 1e-9;

function axisResult(
  chain: MagnifierChain,
  v: ChainVariant,
  phiMn: number,
  deltaS: number | null | undefined,
): AxisResult {
  const slender = chain.slender;
  const stable = !v.unstable;
  const r: AxisResult = {
    klur: chain.klur,
    limit: chain.limit,
    slender,
    EI: slender ? v.EI : null,
    Pc: slender ? v.Pc : null,
    Cm: slender ? v.Cm : null,
    delta: slender ? (stable ? v.delta : null) : 1,
    M2: v.M2,
    Mc: v.Mc,
    phiMn: phiMn > 0 ? phiMn : 0,
    ratio: !stable || !(phiMn > 0) ? (v.Mc > 0 || !stable ? null : 0) : v.Mc / phiMn,
  };
  if (deltaS !== undefined) r.deltaS = deltaS;
  return r;
}

function caseReasons(
  prep: PreparedMember,
  load: LoadCase,
  s: CaseScratch,
  vx: ChainVariant,
  vy: ChainVariant,
  x: AxisResult,
  y: AxisResult,
  utilization: number | null,
): string[] {
  const u = prep.displayUnits;
  const sec = prep.section;
  const reasons: string[] = [];
  const f = s.failure;
  if (f === "axial") {
    reasons.push(
      load.Pu > sec.phiPnMax
        ? `Pu = ${formatForce(load.Pu, u)} exceeds φPn,max = ${formatForce(sec.phiPnMax, u)} (Table 22.4.2.1)`
        : `tension Pu = ${formatForce(load.Pu, u)} exceeds φPnt = ${formatForce(0.9 * sec.Pnt, u)} (22.4.3.1)`,
    );
  } else if (f === "sway") {
    reasons.push(s.swayError ?? "sway magnifier not available (6.6.4.6)");
  } else if (f === "unstable") {
    const ax = s.failAxis ?? "x";
    const v = ax === "x" ? vx : vy;
    reasons.push(`unstable about ${ax}: Pu = ${formatForce(load.Pu, u)} ≥ 0.75 Pc = ${formatForce(0.75 * v.Pc, u)} (6.6.4.5.2)`);
  } else if (f === "cap") {
    const ax = s.failAxis ?? "x";
    const v = ax === "x" ? vx : vy;
    reasons.push(
      `second-order moment about ${ax} exceeds 1.4 × the first-order moment: δ = ${round3(v.delta)} > 1.4 (6.2.5.3); stiffen the column or add a brace`,
    );
  } else if (f === "no-capacity") {
    reasons.push(`no moment strength at Pu = ${formatForce(load.Pu, u)}${s.failAxis ? ` about ${s.failAxis}` : ""}`);
  } else if (utilization !== null && utilization > 1 + PASS_TOL) {
    if (Number.isFinite(s.biaxialCap)) {
      const Mr = Math.hypot(vx.Mc, vy.Mc);
      reasons.push(
        `resultant Mc exceeds φMn at Pu in its direction (θ = ${((s.theta * 180) / Math.PI).toFixed(1)}°): ${formatMoment(Mr, u)} > ${formatMoment(s.biaxialCap, u)} (biaxial, §7.4)`,
      );
    } else {
      const axial = load.Pu / sec.phiPnMax;
      if (x.ratio !== null && x.ratio > 1 + PASS_TOL) {
        reasons.push(`Mc exceeds phiMn at Pu about x: Mc = ${formatMoment(x.Mc, u)} > φMn = ${formatMoment(x.phiMn, u)}`);
      }
      if (y.ratio !== null && y.ratio > 1 + PASS_TOL) {
        reasons.push(`Mc exceeds phiMn at Pu about y: Mc = ${formatMoment(y.Mc, u)} > φMn = ${formatMoment(y.phiMn, u)}`);
      }
      if (axial > 1 + PASS_TOL) reasons.push(`Pu exceeds φPn,max (Table 22.4.2.1)`);
    }
  }
  // values that cannot exist are null: say why
  if (!x.slender) reasons.push("slenderness neglected about x (k ℓu/r within the 6.2.5.1 limit): δ = 1; EI, Pc, Cm are null");
  if (!y.slender) reasons.push("slenderness neglected about y (k ℓu/r within the 6.2.5.1 limit): δ = 1; EI, Pc, Cm are null");
  if (s.variant === "raise-x") reasons.push("M2,min = Pu(0.6 + 0.03h) governs about x (6.6.4.5.4); Cm = 1.0");
  if (s.variant === "raise-y") reasons.push("M2,min = Pu(0.6 + 0.03h) governs about y (6.6.4.5.4); Cm = 1.0");
  if (f === "axial" && !(load.Pu <= sec.phiPnMax)) reasons.push("φMn at Pu does not exist above φPn,max: phiMn is 0, ratios are null");
  return reasons;
}

/**
 * Build the contract's case result for a case already evaluated into `s`.
 * @internal
 */
function buildCase(prep: PreparedMember, load: LoadCase, s: CaseScratch): CaseResult {
  const Pu = load.Pu;
  const util = s.utilization;
  const seg = s.segment;
  // the chains must hold the governing segment's values (re-run when another was evaluated last)
  if (s.chainSegment !== seg) {
    runAxis(prep, prep.x, prep.swayX, load.Mx, Pu, load.betaDns, seg, s.seg, s.chainX);
    runAxis(prep, prep.y, prep.swayY, load.My, Pu, load.betaDns, seg, s.seg, s.chainY);
    s.chainSegment = seg;
  }
  const cx = s.chainX;
  const cy = s.chainY;
  const vx = s.variant === "raise-x" ? cx.raised : cx.given;
  const vy = s.variant === "raise-y" ? cy.raised : cy.given;
  const axialOk = s.failure !== "axial";
  const capX = axialOk ? capacityX(prep, s, Pu) : 0;
  const capY = axialOk ? capacityY(prep, s, Pu) : 0;
  const dsX = prep.swayX === null ? undefined : Number.isFinite(prep.swayX.deltaS) ? prep.swayX.deltaS : null;
  const dsY = prep.swayY === null ? undefined : Number.isFinite(prep.swayY.deltaS) ? prep.swayY.deltaS : null;
  const x = axisResult(cx, vx, capX, dsX);
  const y = axisResult(cy, vy, capY, dsY);
  const utilization = Number.isFinite(util) ? util : null;
  let biaxial: CaseResult["biaxial"] = null;
  if (Number.isFinite(s.biaxialCap) && utilization !== null) {
    const Mr = Math.hypot(vx.Mc, vy.Mc);
    biaxial = {
      Mcx: vx.Mc,
      Mcy: vy.Mc,
      phiMn: s.biaxialCap,
      ratio: Mr / s.biaxialCap,
      theta: (s.theta * 180) / Math.PI,
    };
    if (prep.bresler && Pu > 0) {
      const b = breslerReciprocal(prep.section, vy.Mc / Pu, vx.Mc / Pu);
      biaxial.bresler = b === null ? null : b.phiPn;
    }
  }
  const pass = utilization !== null && utilization <= 1 + PASS_TOL;
  return {
    name: load.name,
    Pu,
    utilization,
    pass,
    reasons: caseReasons(prep, load, s, vx, vy, x, y, utilization),
    x,
    y,
    biaxial,
    segment: seg,
    m2min: s.variant === "raise-x" ? "x" : s.variant === "raise-y" ? "y" : null,
  };
}

/** Last quantities per section (searches re-check one section under many load sets). */
const quantityCache = new WeakMap<ResolvedSection, { L: number; alongH: number; alongB: number; q: QuantityDetail }>();

/** computeQuantities, reused while the section, the length and the cross-ties are the same (read-only result). */
function quantitiesOf(
  section: ResolvedSection,
  member: MemberInput,
  crossTies: { alongH: number; alongB: number },
): QuantityDetail {
  const L = member.pourHeight ?? member.lu;
  const hit = quantityCache.get(section);
  if (hit !== undefined && hit.L === L && hit.alongH === crossTies.alongH && hit.alongB === crossTies.alongB) return hit.q;
  const q = computeQuantities(section, member, crossTies);
  quantityCache.set(section, { L, alongH: crossTies.alongH, alongB: crossTies.alongB, q });
  return q;
}

/** Extra inputs of a check besides section, member and loads. */
export interface CheckExtras {
  prices?: Prices;
  carbon?: CarbonFactors;
  /** a prepared member to reuse (must belong to the same section, member and options) */
  prepared?: PreparedMember;
}

function validateLoad(load: LoadCase, i: number): void {
  if (typeof load.Pu !== "number" || !Number.isFinite(load.Pu)) throw new RangeError(`loads.${i}.Pu must be a finite number`);
  if (!(load.betaDns >= 0 && load.betaDns <= 1)) throw new RangeError(`loads.${i}.betaDns must be within 0…1 (6.6.4.4.4)`);
  if (load.Mx === undefined) throw new RangeError(`loads.${i}.Mx is required`);
  validateEndMoments(load.Mx, i, "Mx");
  if (load.My !== undefined) validateEndMoments(load.My, i, "My");
}

function validateEndMoments(m: NonNullable<LoadCase["Mx"]>, i: number, key: "Mx" | "My"): void {
  if (!(m.M1 >= 0) || !(m.M2 >= 0) || !Number.isFinite(m.M1) || !Number.isFinite(m.M2)) {
    throw new RangeError(`loads.${i}.${key}: M1 and M2 must be finite magnitudes ≥ 0`);
  }
  if (m.M1 > m.M2) throw new RangeError(`loads.${i}.${key}.M1 must not exceed M2 (magnitudes, column-checks.md §3)`);
}

/**
 * Member check on an already resolved section: slenderness and moment magnification about
 * both axes for every load case, strength at each case's Pu, detailing, quantities and —
 * when prices / carbon factors are given — cost and carbon. Same output as checkMember
 * (the CLI / API contract), in engine units (kip, in, kip-in).
 *
 * @param section from resolveSection
 * @param member member data (in)
 * @param loads factored load cases (kip, kip-in); at least one
 * @param options ei (default "b"), dagg, rhoMax, exposure, radius, displayUnits
 * @param extras prices, carbon, a reusable PreparedMember
 * @throws RangeError for invalid member or load data (an infeasible design is a result, not an error)
 * @example checkResolved(resolveSection(s), member, loads, { ei: "b" }).utilization
 */
export function checkResolved(
  section: ResolvedSection,
  member: MemberInput,
  loads: readonly LoadCase[],
  options: CheckOptions = {},
  extras: CheckExtras = {},
): CheckOutput {
  if (loads.length === 0) throw new RangeError("loads must hold at least one load case");
  for (let i = 0; i < loads.length; i++) validateLoad(loads[i] as LoadCase, i);
  if (extras.prepared !== undefined && (extras.prepared.section !== section || extras.prepared.member !== member)) {
    throw new RangeError("extras.prepared belongs to another section or member");
  }
  const prep = extras.prepared ?? prepareMember(section, member, options);
  const s = createCaseScratch();
  const cases: CaseResult[] = new Array<CaseResult>(loads.length);
  let worst = -Infinity;
  let governing: string | null = null;
  let allPass = true;
  for (let i = 0; i < loads.length; i++) {
    const load = loads[i] as LoadCase;
    const u = evaluateCase(prep, load, s);
    const c = buildCase(prep, load, s);
    cases[i] = c;
    if (!c.pass) allPass = false;
    if (u > worst) {
      worst = u;
      governing = load.name;
    }
  }
  const { rules, crossTies } = checkDetailing(section, options);
  const q = quantitiesOf(section, member, crossTies);
  const detailingOk = rules.every((r) => r.ok);
  const reasons: string[] = [];
  for (const r of rules) if (!r.ok) reasons.push(`detailing ${r.rule} (${r.clause}): ${r.message ?? "fails"}`);
  for (const c of cases) if (!c.pass) reasons.push(`load case "${c.name}": ${c.reasons[0] ?? "utilization exceeds 1.0"}`);
  if (prep.braceLevels > 0) {
    reasons.push(
      `${prep.braceLevels} intermediate brace level${prep.braceLevels > 1 ? "s" : ""} assumed to restrain both axes: design each brace separately (not designed here; common practice 1–2 % of the column load)`,
    );
  }
  const notes: string[] = [
    options.radius === "gross" ? "r = √(Ig/Ag) of the gross section (6.2.5.2)" : "r = 0.30 h (rectangle) or 0.25 D (circle) (6.2.5.2)",
    "βdns as given with each load case (6.6.4.4.4)",
    "M2,min applied one axis at a time; the worse variant governs (6.6.4.5.4)",
    "moments are end-moment magnitudes; single curvature makes M1/M2 negative (6.6.4.5.3)",
  ];
  if (!member.braced) notes.push("sway column: M = Mns + δs·Ms at each end (6.6.4.6); along the length k = 1.0 is used in Pc");
  if (section.confinement === "spiral") notes.push("spiral fyt taken equal to fy");
  const out: CheckOutput = {
    pass: allPass && detailingOk,
    utilization: Number.isFinite(worst) ? worst : null,
    governing,
    section: {
      Ag: section.Ag,
      Ast: section.Ast,
      rho: section.rho,
      P0: section.P0,
      phiPnMax: section.phiPnMax,
      bars: section.bars.map((b) => ({ x: b.x, y: b.y, size: b.size, area: b.area, db: b.db })),
      detailing: rules,
    },
    cases,
    quantities: { concreteYd3: q.concreteYd3, steelLb: q.steelLb, formFt2: q.formFt2, ties: q.ties, crossTies: q.crossTies },
    reasons,
    assumptions: {
      code: CODE_EDITION,
      ei: prep.option,
      braced: member.braced,
      kx: member.kx,
      ky: member.ky,
      caution: CAUTION,
      notes,
    },
  };
  if (extras.prices !== undefined) {
    const label = prep.displayUnits === "SI" ? `${Number((section.fc * MPA_PER_KSI).toPrecision(4))} MPa` : `${section.fc} ksi`;
    out.cost = computeCost(q, section.fc, prep.braceLevels, extras.prices, label);
  }
  if (extras.carbon !== undefined) out.carbon = computeCarbon(q, section.fc, extras.carbon);
  return out;
}
