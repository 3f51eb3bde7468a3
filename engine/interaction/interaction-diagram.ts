import { EPS_CU } from "../materials";
import type { Axis, DiagramPoint, DiagramResult, ResolvedSection } from "../types";
import { findRoot } from "./find-root";
import { PHI_TENSION, evaluate, kernelOf, phiPnAt, uniDirection } from "./section-kernel";
import { phiOf } from "./phi-factor";

/**
 * Uniaxial interaction diagram by strain compatibility (22.2), from pure compression
 * to pure tension.
 *
 * Points are taken at neutral-axis depths c (in) from c(P0) — the smallest c at which
 * the block covers the section and every bar has yielded in compression, so Pn = P0
 * exactly — down to c = 0 (pure tension, Pn = −fy Ast). The grid is uniform in c over
 * the range where the block is partial, a tenth of the points geometric in c between that
 * and c(P0), and
 * always includes: the point where φPn(c) = φPn,max (the corner of the design curve),
 * εt = εty (compression-controlled limit, the balanced point for a two-layer section),
 * and εt = εty + 0.003 (tension-controlled limit). The list holds exactly `points`
 * entries (duplicates merged may make it a few shorter).
 *
 * Each point: `Pn`, `Mn` nominal and uncapped (so the nominal curve reaches P0), `phi`
 * from Table 21.2.2, `phiPn` = min(φ Pn, φPn,max) — the design curve is cut flat at
 * φPn,max (Table 22.4.2.1) — and `phiMn` = φ Mn. `Mn` is the moment in the requested
 * sense (sense 1: compression on the +y face for axis "x", on the +x face for "y").
 * At the pure-tension end c = 0, φ = 0.90 and εt is reported as εty + 0.003 (any
 * larger uniform strain gives the same point).
 *
 * @param section from resolveSection
 * @param axis "x" or "y"
 * @param points number of points, integer 8…2000 (default 60)
 * @param sense 1 (default) or −1
 * @throws TypeError for a bad axis, RangeError for a bad point count or sense
 * @example interactionDiagram(section, "x", 60).points[0].Pn === section.P0
 */
export function interactionDiagram(section: ResolvedSection, axis: Axis, points = 60, sense: 1 | -1 = 1): DiagramResult {
  if (axis !== "x" && axis !== "y") throw new TypeError(`axis must be "x" or "y" (got ${JSON.stringify(axis)})`);
  if (!Number.isInteger(points) || points < 8 || points > 2000) {
    throw new RangeError(`points must be an integer from 8 to 2000 (got ${String(points)})`);
  }
  if (sense !== 1 && sense !== -1) throw new RangeError(`sense must be 1 or -1 (got ${String(sense)})`);
  const k = kernelOf(section);
  const idx = ((axis === "x" ? 0 : 1) + (sense === 1 ? 0 : 2)) as 0 | 1 | 2 | 3;
  const dir = uniDirection(k, idx);
  const px = axis === "x" ? sense : 0;
  const py = axis === "y" ? sense : 0;

  const special: number[] = [dir.cP0, 0];
  // between the full block and c(P0) only the steel strains change: a tenth of the points,
  // geometric in c, keeps consecutive points close near pure compression
  if (dir.cP0 > dir.cFull * (1 + 1e-9)) {
    const nTop = Math.max(2, Math.round(points / 10));
    const r = dir.cP0 / dir.cFull;
    for (let i = 0; i < nTop; i++) special.push(dir.cFull * Math.pow(r, i / nTop));
  }
  if (dir.dt > 0) {
    special.push((EPS_CU * dir.dt) / (EPS_CU + k.epsTy), (EPS_CU * dir.dt) / (2 * EPS_CU + k.epsTy));
  }
  // corner of the design curve: φPn(c) = φPn,max, the largest such c
  const cap = k.phiPnMax;
  const fTop = phiPnAt(k, dir, dir.cFull) - cap;
  if (fTop > 0) {
    // search downward from cFull for the first bracket
    const steps = 48;
    let hi = dir.cFull;
    let fhi = fTop;
    for (let i = steps - 1; i >= 0; i--) {
      const lo = (dir.cFull * i) / steps;
      const flo = phiPnAt(k, dir, lo) - cap;
      if (flo <= 0) {
        special.push(findRoot((c) => phiPnAt(k, dir, c) - cap, lo, hi, flo, fhi, 1e-12 * dir.cP0, 1e-11 * k.P0));
        break;
      }
      hi = lo;
      fhi = flo;
    }
  } else {
    const fP0 = phiPnAt(k, dir, dir.cP0) - cap;
    special.push(findRoot((c) => phiPnAt(k, dir, c) - cap, dir.cFull, dir.cP0, fTop, fP0, 1e-12 * dir.cP0, 1e-11 * k.P0));
  }
  const uniform = Math.max(2, points - special.length + 1);
  const cs: number[] = [...special];
  for (let i = 1; i < uniform; i++) cs.push((dir.cFull * i) / uniform);
  cs.sort((a, b) => b - a);
  const merged: number[] = [];
  for (const c of cs) {
    const last = merged[merged.length - 1];
    if (last === undefined || Math.abs(last - c) > 1e-9 * dir.cP0) merged.push(c);
  }

  const out = new Float64Array(4);
  const pts: DiagramPoint[] = merged.map((c) => {
    evaluate(k, dir, c, out);
    const Pn = out[0] as number;
    const Mn = (out[1] as number) * px + (out[2] as number) * py;
    const epsT = out[3] as number;
    const phi = c === 0 ? PHI_TENSION : phiOf(epsT, k.epsTy, k.phiC);
    return { c, Pn, Mn, phi, phiPn: Math.min(phi * Pn, cap), phiMn: phi * Mn, epsT };
  });
  return { P0: k.P0, phiPnMax: k.phiPnMax, points: pts };
}
