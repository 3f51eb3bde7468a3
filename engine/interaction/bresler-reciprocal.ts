import type { ResolvedSection } from "../types";
import { findRoot } from "./find-root";
import { evaluate, kernelOf, uniScan, type Kernel } from "./section-kernel";
import { phiOf } from "./phi-factor";

/** Bresler reciprocal-load estimate (comparison only). */
export interface BreslerResult {
  /** nominal axial strength under both eccentricities, 1/Pn = 1/Pnx + 1/Pny − 1/P0, kip */
  Pn: number;
  /** design value φPn with φ the smaller of the two uniaxial φ, capped at φPn,max, kip */
  phiPn: number;
  /** nominal axial strength with eccentricity ey only (bending about x), kip */
  Pnx: number;
  /** nominal axial strength with eccentricity ex only (bending about y), kip */
  Pny: number;
  P0: number;
  phi: number;
}

const out = new Float64Array(4);

/** Pn and φ at eccentricity e (in, ≥ 0) in uniaxial direction idx; compression branch. */
function axialAtEccentricity(k: Kernel, idx: 0 | 1 | 2 | 3, e: number): { Pn: number; phi: number } | null {
  const scan = uniScan(k, idx);
  const dir = scan.dir;
  const px = idx === 0 ? 1 : idx === 2 ? -1 : 0;
  const py = idx === 1 ? 1 : idx === 3 ? -1 : 0;
  const h = (c: number): number => {
    evaluate(k, dir, c, out);
    return (out[1] as number) * px + (out[2] as number) * py - e * (out[0] as number);
  };
  if (e === 0) return { Pn: k.P0, phi: k.phiC };
  // walk down from c(P0): the first sign change of Mn − e·Pn is the compression-side point
  let hiC = dir.cP0;
  let fhi = h(hiC);
  for (let i = scan.m - 1; i >= 0; i--) {
    const lo = scan.cR[i] as number;
    if (!(lo < hiC)) continue;
    const flo = h(lo);
    if (flo < 0 !== fhi < 0) {
      const c = findRoot(h, lo, hiC, flo, fhi, 1e-12 * dir.cP0, 1e-10 * k.P0);
      evaluate(k, dir, c, out);
      const Pn = out[0] as number;
      if (!(Pn > 0)) return null;
      return { Pn, phi: phiOf(out[3] as number, k.epsTy, k.phiC) };
    }
    hiC = lo;
    fhi = flo;
  }
  return null;
}

/**
 * Bresler's reciprocal-load formula, 1/Pn = 1/Pnx + 1/Pny − 1/P0, for a load at
 * eccentricities ex (along x, so My = P·ex) and ey (along y, so Mx = P·ey). Pnx and Pny
 * are the uniaxial strain-compatibility strengths at those eccentricities. For
 * comparison only (column-checks.md §2): the project's biaxial check rotates the
 * neutral axis (phiMnAtAngle). The formula is commonly held reliable only for
 * Pn ≥ 0.1 f'c Ag (from memory).
 *
 * @param section from resolveSection
 * @param ex eccentricity along x, in (|My|/P; the sign picks the sense)
 * @param ey eccentricity along y, in (|Mx|/P)
 * @returns the estimate, or null when an eccentricity has no compression-side solution
 * @throws RangeError for non-finite eccentricities
 * @example breslerReciprocal(section, 4, 6)?.phiPn
 */
export function breslerReciprocal(section: ResolvedSection, ex: number, ey: number): BreslerResult | null {
  if (!Number.isFinite(ex) || !Number.isFinite(ey)) throw new RangeError(`ex and ey must be finite (got ${ex}, ${ey})`);
  const k = kernelOf(section);
  const x = axialAtEccentricity(k, ey >= 0 ? 0 : 2, Math.abs(ey));
  const y = axialAtEccentricity(k, ex >= 0 ? 1 : 3, Math.abs(ex));
  if (x === null || y === null) return null;
  const inv = 1 / x.Pn + 1 / y.Pn - 1 / k.P0;
  if (!(inv > 0)) return null;
  const Pn = 1 / inv;
  const phi = Math.min(x.phi, y.phi);
  return { Pn, phiPn: Math.min(phi * Pn, k.phiPnMax), Pnx: x.Pn, Pny: y.Pn, P0: k.P0, phi };
}
