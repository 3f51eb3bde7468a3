/**
 * Brent's method (inverse quadratic interpolation and secant steps safeguarded by
 * bisection) for a continuous function with a sign change on [lo, hi].
 *
 * @param f the function
 * @param lo left end of the bracket; flo = f(lo)
 * @param hi right end; fhi = f(hi), of opposite sign to flo
 * @param xtol bracket width at which to stop
 * @param ftol |f| at which to stop
 * @returns x with |f(x)| ≤ ftol or within xtol of a sign change
 * @internal
 * @example findRoot((x) => x * x - 2, 0, 2, -2, 2, 1e-14, 1e-14) // ≈ √2
 */
export function findRoot(
  f: (x: number) => number,
  lo: number,
  hi: number,
  flo: number,
  fhi: number,
  xtol: number,
  ftol: number,
): number {
  let a = lo;
  let b = hi;
  let fa = flo;
  let fb = fhi;
  if (fa === 0) return a;
  if (fb === 0) return b;
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iter = 0; iter < 200; iter++) {
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2e-16 * Math.abs(b) + 0.5 * xtol;
    const xm = 0.5 * (c - b);
    if (Math.abs(xm) <= tol || Math.abs(fb) <= ftol) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * xm * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * xm * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * xm * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = xm;
        e = d;
      }
    } else {
      d = xm;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : xm > 0 ? tol : -tol;
    fb = f(b);
  }
  return b;
}
