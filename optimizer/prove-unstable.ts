/**
 * A proof, without resolving the section, that a candidate fails a load case by instability:
 * Pu ≥ 0.75 Pc about an axis that is slender in every segment (6.6.4.5.2). Most candidates
 * cheaper than the first passing one fail this way, and resolving and preparing each costs
 * more than the case itself.
 *
 * It mirrors the engine's chain for braced columns with EI option (a) or (b) (6.6.4.4.4):
 * EI = EI0 / (1 + βdns), EI0 = 0.4 Ec Ig or 0.2 Ec Ig + Es Ise, Pc = π² EI / (k ℓu)² with ℓu of
 * one segment; an axis with k ℓu/r > 40 is slender whatever the end moments (the braced limit
 * 34 + 12 M1/M2 never exceeds 40, 6.2.5.1), and with option (a)/(b) EI does not depend on the
 * moment, so the M2,min variant is as unstable as the given one.
 *
 * It also proves the 1.4 cap exceeded (6.2.5.3) where M2,min governs a segment
 * (M2 < Pu(0.6 + 0.03h), 6.6.4.5.4): that variant has Cm = 1.0, first-order moment M2,min and
 * δ = 1/(1 − Pu/(0.75 Pc)), so δ > 1.4 fails the case. A 1e-9 margin keeps round-off
 * on the safe side: a candidate this calls unstable is one the engine fails
 * (tests/unit/optimizer-space.test.ts checks it over whole spaces). Anything else is left to
 * the engine.
 */
import { computeMinimumMoment, computeSegmentEndMoments, concreteModulus, ES, type SegmentEndMoments } from "../engine";
import type { EndMoments } from "../engine/types";
import type { Family, SearchProblem, Valued } from "./search-space";

const MARGIN = 1e-9;
const seg: SegmentEndMoments = { M1: 0, M2: 0, curvature: "single" };

/** Ise about x and y of one layout (Σ A y², Σ A x²) at the engine's bar positions, in⁴. */
export function steelInertiaOf(problem: SearchProblem, fam: Family, layoutIndex: number): [number, number] {
  const [a, b] = fam.layouts[layoutIndex] as [number, number];
  const edge = problem.cover + fam.tieDb + fam.db / 2;
  const A = fam.area;
  let ix = 0;
  let iy = 0;
  if (fam.shape === "rect") {
    const xe = fam.b / 2 - edge;
    const ye = fam.h / 2 - edge;
    // positions as the layout spreads them: lo + (hi − lo)·i/(n − 1)
    for (let i = 0; i < a; i++) {
      const x = a === 1 ? 0 : -xe + (2 * xe * i) / (a - 1);
      ix += 2 * A * ye * ye;
      iy += 2 * A * x * x;
    }
    for (let j = 1; j <= b - 2; j++) {
      const y = -ye + (2 * ye * j) / (b - 1);
      ix += 2 * A * y * y;
      iy += 2 * A * xe * xe;
    }
  } else {
    const R = fam.D / 2 - edge;
    for (let i = 0; i < a; i++) {
      const t = (2 * Math.PI * i) / a;
      const x = R * Math.sin(t);
      const y = R * Math.cos(t);
      ix += A * y * y;
      iy += A * x * x;
    }
  }
  return [ix, iy];
}

/**
 * Index of a load case that certainly makes the candidate unstable, or -1 when none is proved.
 */
export function proveUnstable(problem: SearchProblem, fam: Family, layoutIndex: number, fcIndex: number, braceLevels: number, ise: [number, number]): number {
  const m = problem.member;
  if (!m.braced) return -1;
  const option = problem.options.ei ?? "b";
  if (option !== "a" && option !== "b") return -1;
  const segments = braceLevels + 1;
  const Ec = concreteModulus((problem.fcs[fcIndex] as Valued).v);
  for (let ax = 0; ax < 2; ax++) {
    const axis = ax === 0 ? "x" : "y";
    const k = axis === "x" ? m.kx : m.ky;
    const lu = ((axis === "x" ? m.lux : m.luy) ?? m.lu) / segments;
    const depth = fam.shape === "circle" ? fam.D : axis === "x" ? fam.h : fam.b;
    const r = fam.shape === "circle" ? 0.25 * fam.D : 0.3 * depth;
    if (!((k * lu) / r > 40 * (1 + MARGIN))) continue;
    const Ig =
      fam.shape === "circle"
        ? (Math.PI * fam.D * fam.D * fam.D * fam.D) / 64
        : axis === "x" ? (fam.b * fam.h * fam.h * fam.h) / 12 : (fam.h * fam.b * fam.b * fam.b) / 12;
    const EI0 = option === "a" ? 0.4 * Ec * Ig : 0.2 * Ec * Ig + ES * (axis === "x" ? ise[0] : ise[1]);
    const pcFactor = (Math.PI * Math.PI) / ((k * lu) * (k * lu));
    for (let i = 0; i < problem.loads.length; i++) {
      const load = problem.loads[i];
      if (load === undefined || !(load.Pu > 0)) continue;
      const Pc = (EI0 / (1 + load.betaDns)) * pcFactor;
      if (load.Pu >= 0.75 * Pc * (1 + MARGIN)) return i;
      // the M2,min variant of a segment where it governs: δ = 1 / (1 − Pu / 0.75 Pc)
      const delta = 1 / (1 - load.Pu / (0.75 * Pc));
      if (!(delta > 1.4 * (1 + MARGIN))) continue;
      const M2min = computeMinimumMoment(load.Pu, depth);
      if (!(M2min > 1e-6)) continue;
      const em: EndMoments | undefined = axis === "x" ? load.Mx : load.My;
      const M1 = em?.M1 ?? 0;
      const M2 = em?.M2 ?? 0;
      const curvature = em?.curvature ?? "double";
      for (let sIdx = 0; sIdx < segments; sIdx++) {
        computeSegmentEndMoments(M1, M2, curvature, braceLevels, sIdx, seg);
        if (seg.M2 < M2min * (1 - MARGIN)) return i;
      }
    }
  }
  return -1;
}
