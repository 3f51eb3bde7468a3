import { describe, expect, it } from "vitest";
import { computePsi, PSI_FIXED, PSI_PINNED, solveBracedK, solveEffectiveLength, solveSwayK } from "@/engine";

function bracedResidual(k: number, a: number, b: number): number {
  // alignment-chart equation, braced (commentary R6.2.5; column-checks.md §3)
  const u = Math.PI / k;
  return (a * b / 4) * u * u + ((a + b) / 2) * (1 - u / Math.tan(u)) + (2 * Math.tan(u / 2)) / u - 1;
}
function swayResidual(k: number, a: number, b: number): number {
  const u = Math.PI / k;
  return (a * b * u * u - 36) / (6 * (a + b)) - u / Math.tan(u);
}

describe("solveBracedK / solveSwayK", () => {
  it("the returned k satisfies the alignment-chart equations (closed-form residual)", () => {
    for (const [a, b] of [[0.2, 0.2], [0.5, 3], [1, 1], [2, 7], [10, 10], [0.1, 40]] as const) {
      const kb = solveBracedK(a, b);
      expect(Math.abs(bracedResidual(kb, a, b))).toBeLessThan(1e-6);
      expect(kb).toBeGreaterThan(0.5);
      expect(kb).toBeLessThan(1);
      const ks = solveSwayK(a, b);
      expect(Math.abs(swayResidual(ks, a, b))).toBeLessThan(1e-8);
      expect(ks).toBeGreaterThan(1);
    }
  });

  it("limits: braced 0.5 fixed–fixed, 1.0 pinned–pinned; sway 1.0 fixed–fixed", () => {
    expect(solveBracedK(0, 0)).toBe(0.5);
    expect(solveBracedK(Infinity, Infinity)).toBe(1);
    expect(solveBracedK(1e6, 1e6)).toBeCloseTo(1, 4);
    expect(solveSwayK(0, 0)).toBe(1);
    expect(solveSwayK(1e-9, 1e-9)).toBeCloseTo(1, 6);
  });

  it("k grows with ψ at either end (monotone)", () => {
    let pb = 0.5;
    let ps = 1;
    for (const psi of [0.1, 0.3, 1, 3, 10, 30]) {
      const kb = solveBracedK(psi, 1);
      const ks = solveSwayK(psi, 1);
      expect(kb).toBeGreaterThan(pb);
      expect(ks).toBeGreaterThan(ps);
      pb = kb;
      ps = ks;
    }
  });

  it("is symmetric in ψA and ψB", () => {
    expect(solveBracedK(0.7, 4)).toBeCloseTo(solveBracedK(4, 0.7), 10);
    expect(solveSwayK(0.7, 4)).toBeCloseTo(solveSwayK(4, 0.7), 10);
  });

  it("solveEffectiveLength dispatches on sway", () => {
    expect(solveEffectiveLength(1, 1, false)).toBe(solveBracedK(1, 1));
    expect(solveEffectiveLength(1, 1, true)).toBe(solveSwayK(1, 1));
  });

  it("rejects negative or NaN ψ, and an infinite ψ for sway (a mechanism)", () => {
    expect(() => solveBracedK(-1, 1)).toThrow(RangeError);
    expect(() => solveBracedK(Number.NaN, 1)).toThrow(RangeError);
    expect(() => solveSwayK(Infinity, 1)).toThrow(RangeError);
  });
});

describe("computePsi", () => {
  it("Σ(0.70 EI/ℓc) of columns ÷ Σ(0.35 EI/ℓ) of beams (Table 6.6.3.1.1(a))", () => {
    const col = { Ec: 4031, Ig: 13000, length: 144 };
    const beam = { Ec: 4031, Ig: 26000, length: 288 };
    // two columns (above and below), two beams: (2 × 0.70 × 13000/144) / (2 × 0.35 × 26000/288) = 2.0
    expect(computePsi([col, col], [beam, beam])).toBeCloseTo(2, 12);
    expect(computePsi([col], [])).toBe(Infinity);
    expect(() => computePsi([], [beam])).toThrow(RangeError);
    expect(() => computePsi([{ ...col, Ig: -1 }], [beam])).toThrow(RangeError);
  });

  it("end-condition values taken in practice: pinned 10, fixed 1 (common practice)", () => {
    expect(PSI_PINNED).toBe(10);
    expect(PSI_FIXED).toBe(1);
  });
});
