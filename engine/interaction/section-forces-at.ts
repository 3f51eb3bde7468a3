import type { ResolvedSection } from "../types";
import { evaluate, kernelOf, newDirection, setDirection } from "./section-kernel";
import { phiOf } from "./phi-factor";

/** Nominal forces of a section at one neutral-axis position. */
export interface SectionForces {
  /** nominal axial strength, kip (compression +) */
  Pn: number;
  /** nominal moment about x, kip-in (+ compresses the +y face) */
  Mnx: number;
  /** nominal moment about y, kip-in (+ compresses the +x face) */
  Mny: number;
  /** net tensile strain in the extreme tension bar (tension +) */
  epsT: number;
  /** φ from Table 21.2.2 for that strain */
  phi: number;
}

/** Unit-vector component with the round-off of sin/cos at multiples of π/2 removed. */
export function snapUnit(v: number): number {
  if (Math.abs(v) < 1e-14) return 0;
  if (Math.abs(v - 1) < 1e-14) return 1;
  if (Math.abs(v + 1) < 1e-14) return -1;
  return v;
}

/**
 * Strain-compatibility forces (22.2) for a neutral axis at any angle.
 *
 * Angle convention: `angleRad` is the direction of the compression side,
 * u = (sin α, cos α): α = 0 compresses the +y face (positive Mx), α = π/2 the +x face
 * (positive My), α = π the −y face. The extreme fibre strain is εcu = 0.003; c is
 * measured from that fibre along u. c = 0 gives pure tension (every bar at −fy,
 * εt reported as εty + 0.003); c = Infinity gives uniform strain εcu (P0 for any section).
 *
 * @param section from resolveSection
 * @param angleRad α, radians (finite)
 * @param c neutral-axis depth, in (≥ 0, may be Infinity)
 * @returns Pn (kip), Mnx and Mny (kip-in), εt and φ
 * @throws RangeError for a non-finite angle or a negative / NaN c
 * @example sectionForcesAt(section, 0, 10) // bending about x, c = 10 in
 */
export function sectionForcesAt(section: ResolvedSection, angleRad: number, c: number): SectionForces {
  if (typeof angleRad !== "number" || !Number.isFinite(angleRad)) throw new RangeError(`angleRad must be finite (got ${String(angleRad)})`);
  if (typeof c !== "number" || Number.isNaN(c) || c < 0) throw new RangeError(`c must be ≥ 0 (got ${String(c)})`);
  const k = kernelOf(section);
  const dir = setDirection(k, snapUnit(Math.sin(angleRad)), snapUnit(Math.cos(angleRad)), newDirection(k));
  const out = new Float64Array(4);
  evaluate(k, dir, c, out);
  const epsT = out[3] as number;
  return { Pn: out[0] as number, Mnx: out[1] as number, Mny: out[2] as number, epsT, phi: phiOf(epsT, k.epsTy, k.phiC) };
}
