import type { EiOption } from "../types";

/** Section and load data for the effective stiffness. Units: ksi, in⁴, in², kip, kip-in, in. */
export interface StiffnessInput {
  option: EiOption;
  Ec: number;
  Es: number;
  /** gross moment of inertia about the bending axis, in⁴ */
  Ig: number;
  /** moment of inertia of the reinforcement about the same axis, in⁴ */
  Ise: number;
  Ast: number;
  Ag: number;
  /** factored axial load, kip */
  Pu: number;
  /** factored moment used with option (c), kip-in */
  Mu: number;
  /** section dimension in the direction considered, in */
  h: number;
  /** P0, kip */
  P0: number;
  betaDns: number;
}

/**
 * Moment of inertia of a compression member per Table 6.6.3.1.1(b):
 * I = (0.80 + 25 Ast/Ag)(1 − Mu/(Pu h) − 0.5 Pu/P0) Ig, within 0.35 Ig … 0.875 Ig.
 * With Pu ≤ 0 the lower bound 0.35 Ig is used (no axial load to stiffen the section).
 *
 * @returns I, in⁴
 * @example computeColumnInertia(13000, 0.02, 300, 1200, 20, 2000) // (0.8+0.5)(1−0.2−0.075)·13000
 */
export function computeColumnInertia(Ig: number, rho: number, Pu: number, Mu: number, h: number, P0: number): number {
  const lo = 0.35 * Ig;
  const hi = 0.875 * Ig;
  if (!(Pu > 0)) return lo;
  const I = (0.8 + 25 * rho) * (1 - Mu / (Pu * h) - (0.5 * Pu) / P0) * Ig;
  return I < lo ? lo : I > hi ? hi : I;
}

/**
 * Effective flexural stiffness EIeff for the moment magnifier, kip-in² (6.6.4.4.4):
 * (a) 0.4 Ec Ig / (1 + βdns); (b) (0.2 Ec Ig + Es Ise) / (1 + βdns); (c) Ec I / (1 + βdns)
 * with I from Table 6.6.3.1.1(b).
 *
 * @example computeEffectiveStiffness({ option: "a", Ec: 4031, Ig: 15972, betaDns: 0.6, ... }) // 0.4·4031·15972/1.6
 */
export function computeEffectiveStiffness(p: StiffnessInput): number {
  const d = 1 + p.betaDns;
  if (p.option === "a") return (0.4 * p.Ec * p.Ig) / d;
  if (p.option === "b") return (0.2 * p.Ec * p.Ig + p.Es * p.Ise) / d;
  return (p.Ec * computeColumnInertia(p.Ig, p.Ast / p.Ag, p.Pu, p.Mu, p.h, p.P0)) / d;
}
