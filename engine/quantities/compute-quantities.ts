import { barProperties } from "../rebar";
import type { MemberInput, Quantities, ResolvedSection } from "../types";
import { computeHookExtension } from "./compute-hook-extension";
import { computeLapLength } from "./compute-lap-length";
import { computeTieCount } from "./compute-tie-count";

/** Quantities with the intermediate lengths and weights behind them. */
export interface QuantityDetail extends Quantities {
  /** length over which quantities are taken (pour height or ℓu), in */
  L: number;
  /** concrete volume, in³ */
  concreteIn3: number;
  longitudinalLb: number;
  tieLb: number;
  crossTieLb: number;
  /** lap length of each bar size used, in */
  lap: number;
  /** length of one hoop (tie centreline + two hook extensions) or the spiral length, in */
  hoopLength: number;
  /** length of one cross-tie with its 135° and 90° hooks, in (longest direction) */
  crossTieLength: number;
  /** formed contact area, ft², and whether the forms are round */
  round: boolean;
}

/**
 * Concrete, steel and formwork quantities for one member (column-checks.md §6):
 * concrete Ag·L / 46 656 yd³; each longitudinal bar (L + compression lap 25.5.5.1) × lb/ft;
 * ties ⌈L/s⌉ + 1 hoops along the tie centreline plus two 135° hook extensions 6 dtie ≥ 3 in
 * (25.3.2); cross-ties where 25.7.2.3 needs them (one 135° and one 90° hook, §7.11); a spiral
 * as its helix length plus 1.5 extra turns at each end (25.7.3.4); forms = perimeter × L.
 *
 * @param section resolved section (in)
 * @param member member (L = pourHeight, else ℓu)
 * @param crossTies cross-ties per tie set `{ alongH, alongB }` (from countCrossTies)
 * @example computeQuantities(sec, { lu: 204, ... }, { alongH: 0, alongB: 0 }).concreteYd3 // 396·204/46656
 */
export function computeQuantities(
  section: ResolvedSection,
  member: Pick<MemberInput, "lu" | "pourHeight">,
  crossTies: { alongH: number; alongB: number },
): QuantityDetail {
  const L = member.pourHeight ?? member.lu;
  if (!(L > 0)) throw new RangeError(`member length must be positive (got ${L})`);
  const concreteIn3 = section.Ag * L;
  let longitudinalLb = 0;
  let lap = 0;
  for (const bar of section.bars) {
    const p = barProperties(bar.size);
    const lp = computeLapLength(section.fy, p.db, section.fc);
    if (lp > lap) lap = lp;
    longitudinalLb += ((L + lp) / 12) * p.weightPlf;
  }
  const tie = barProperties(section.tie.size);
  const dt = tie.db;
  const hook135 = computeHookExtension(dt);
  let ties: number;
  let hoopLength: number;
  let tieLb: number;
  let crossTieLb = 0;
  let crossTieLength = 0;
  let nCross = 0;
  if (section.shape === "circle" && section.confinement === "spiral") {
    // spiral: helix of diameter D − 2 cover − dsp at pitch s, plus 1.5 extra turns each end (25.7.3.4)
    const d = section.D - 2 * section.cover - dt;
    const s = section.tie.spacing;
    const turns = L / s + 3;
    hoopLength = turns * Math.hypot(Math.PI * d, s);
    ties = Math.ceil(turns);
    tieLb = (hoopLength / 12) * tie.weightPlf;
  } else {
    ties = computeTieCount(L, section.tie.spacing);
    if (section.shape === "circle") {
      hoopLength = Math.PI * (section.D - 2 * section.cover - dt) + 2 * hook135;
    } else {
      const bc = section.b - 2 * section.cover - dt;
      const hc = section.h - 2 * section.cover - dt;
      hoopLength = 2 * (bc + hc) + 2 * hook135;
      const hook90 = 6 * dt; // §7.11
      const lenH = hc + hook135 + hook90;
      const lenB = bc + hook135 + hook90;
      crossTieLength = crossTies.alongH > 0 ? lenH : crossTies.alongB > 0 ? lenB : 0;
      if (crossTies.alongB > 0 && lenB > crossTieLength) crossTieLength = lenB;
      nCross = ties * (crossTies.alongH + crossTies.alongB);
      crossTieLb = ((ties * (crossTies.alongH * lenH + crossTies.alongB * lenB)) / 12) * tie.weightPlf;
    }
    tieLb = ((ties * hoopLength) / 12) * tie.weightPlf;
  }
  const perimeter = section.shape === "circle" ? Math.PI * section.D : 2 * (section.b + section.h);
  return {
    concreteYd3: concreteIn3 / 46656,
    steelLb: longitudinalLb + tieLb + crossTieLb,
    formFt2: (perimeter * L) / 144,
    ties,
    crossTies: nCross,
    L,
    concreteIn3,
    longitudinalLb,
    tieLb,
    crossTieLb,
    lap,
    hoopLength,
    crossTieLength,
    round: section.shape === "circle",
  };
}
