import { describe, expect, it } from "vitest";
import { solveBracedK, solveSwayK } from "@/engine";

// Readings of the alignment charts (Jackson–Moreland nomographs) printed in the commentary to
// ACI 318-19 6.2.5, Fig. R6.2.5.1 (the same charts appear in the AISC 360 commentary), read
// by eye to two decimals (from memory). Tolerance ±0.02 reflects reading a nomograph.
describe("alignment-chart readings (commentary Fig. R6.2.5.1, from memory)", () => {
  it.each([
    // braced (nonsway) frames, chart (a)
    [1, 1, false, 0.77],
    [0, 0, false, 0.5],
    [10, 10, false, 0.96],
    [2, 2, false, 0.86],
    [0.5, 0.5, false, 0.67],
    // sway frames, chart (b)
    [1, 1, true, 1.32],
    [0, 0, true, 1.0],
    [10, 10, true, 3.0],
    [0.5, 0.5, true, 1.16],
  ])("ψA = %s, ψB = %s, sway %s → k ≈ %s", (a, b, sway, k) => {
    const got = sway ? solveSwayK(a, b) : solveBracedK(a, b);
    expect(Math.abs(got - k)).toBeLessThanOrEqual(0.02);
  });

  it("a sway column fixed at one end and nearly free at the other approaches k = 2 (Euler flagpole, closed form)", () => {
    expect(solveSwayK(0, 1e7)).toBeCloseTo(2, 3);
  });
});
