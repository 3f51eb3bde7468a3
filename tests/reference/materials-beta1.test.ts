import { describe, expect, it } from "vitest";
import { beta1, concreteModulus, resolveSection } from "@/engine";

// Table 22.2.2.4.3 (ACI 318-19): β1 = 0.85 for 2500 ≤ f'c ≤ 4000 psi; 0.85 − 0.05(f'c − 4000)/1000
// between 4000 and 8000 psi; 0.65 at and above 8000 psi.
describe("β1 points (Table 22.2.2.4.3)", () => {
  it.each([
    [2.5, 0.85],
    [4, 0.85],
    [5, 0.8],
    [6, 0.75],
    [7, 0.7],
    [8, 0.65],
    [10, 0.65],
  ])("f'c = %s ksi → β1 = %s", (fc, b1) => {
    expect(beta1(fc)).toBeCloseTo(b1, 12);
  });

  it("Ec = 57 000 √f'c psi (19.2.2.1(b)): 5 ksi → 4031 ksi", () => {
    expect(concreteModulus(5)).toBeCloseTo(4030.5, 1);
  });

  it("a resolved section carries them", () => {
    const s = resolveSection({ shape: "rect", b: 12, h: 12, fc: 6, fy: 60, confinement: "tied", cover: 1.5, layout: { type: "perimeter", size: "#6", nb: 2, nh: 2 } });
    expect(s.beta1).toBeCloseTo(0.75, 12);
  });
});
