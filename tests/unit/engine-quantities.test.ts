import { describe, expect, it } from "vitest";
import {
  checkResolved,
  computeCarbon,
  computeCost,
  computeHookExtension,
  computeLapLength,
  computeQuantities,
  computeTieCount,
  countCrossTies,
  lookupByStrength,
  resolveSection,
  type Prices,
} from "@/engine";

const PRICES: Prices = { concrete: { "4": 190, "5": 200 }, steel: 1.15, formwork: 13.5, roundFormwork: 18, brace: 2400 };

describe("computeLapLength (25.5.5.1)", () => {
  it("fy ≤ 60 ksi: 0.0005 fy db; fy > 60: (0.0009 fy − 24) db; ≥ 12 in; +1/3 below 3 ksi", () => {
    expect(computeLapLength(60, 1.0, 5)).toBeCloseTo(0.0005 * 60000 * 1.0, 12); // 30 in
    expect(computeLapLength(75, 1.0, 5)).toBeCloseTo((0.0009 * 75000 - 24) * 1.0, 12); // 43.5 in
    expect(computeLapLength(60, 0.375, 5)).toBe(12); // 11.25 → 12 in minimum
    expect(computeLapLength(60, 1.0, 2.5)).toBeCloseTo(40, 12);
  });
});

describe("tie counts and hooks", () => {
  it("computeTieCount = ⌈L/s⌉ + 1 with s rounded down to a whole inch (column-checks.md §6)", () => {
    expect(computeTieCount(204, 16)).toBe(Math.ceil(204 / 16) + 1); // 14
    expect(computeTieCount(192, 16)).toBe(13);
    expect(computeTieCount(204, 16.9)).toBe(14);
  });
  it("computeHookExtension = 6 dtie ≥ 3 in (25.3.2)", () => {
    expect(computeHookExtension(0.375)).toBe(3);
    expect(computeHookExtension(0.625)).toBeCloseTo(3.75, 12);
  });
});

describe("computeQuantities", () => {
  const s = resolveSection({
    shape: "rect", b: 18, h: 22, fc: 5, fy: 60, confinement: "tied", cover: 1.5,
    layout: { type: "perimeter", size: "#8", nb: 3, nh: 4 },
  });
  const ct = countCrossTies(s);
  const q = computeQuantities(s, { lu: 204 }, ct);

  it("concrete Ag·L / 46 656 yd³ and forms perimeter × L / 144 ft²", () => {
    expect(q.concreteYd3).toBeCloseTo((396 * 204) / 46656, 12);
    expect(q.formFt2).toBeCloseTo((2 * (18 + 22) * 204) / 144, 12);
  });

  it("longitudinal steel: each bar (L + lap) × lb/ft (ASTM A615 #8: 2.670 lb/ft)", () => {
    expect(q.longitudinalLb).toBeCloseTo((10 * (204 + 30) / 12) * 2.67, 9);
  });

  it("ties: count, hoop on the tie centreline + two hook extensions, cross-ties with 135° + 90° hooks (§7.11)", () => {
    expect(q.ties).toBe(14);
    const bc = 18 - 3 - 0.375;
    const hc = 22 - 3 - 0.375;
    expect(q.hoopLength).toBeCloseTo(2 * (bc + hc) + 2 * 3, 12);
    expect(q.tieLb).toBeCloseTo((14 * q.hoopLength / 12) * 0.376, 9);
    // one cross-tie per set parallel to b (holding the 4-bar faces of width h)
    expect(ct).toMatchObject({ alongB: 1, alongH: 0 });
    expect(q.crossTies).toBe(14);
    expect(q.crossTieLb).toBeCloseTo((14 * (bc + 3 + 6 * 0.375) / 12) * 0.376, 9);
    expect(q.steelLb).toBeCloseTo(q.longitudinalLb + q.tieLb + q.crossTieLb, 9);
  });

  it("pour height replaces ℓu when given", () => {
    expect(computeQuantities(s, { lu: 204, pourHeight: 240 }, ct).concreteYd3).toBeCloseTo((396 * 240) / 46656, 12);
  });

  it("spiral: helix length with 1.5 extra turns at each end (25.7.3.4); round forms", () => {
    const sp = resolveSection({ shape: "circle", D: 20, fc: 5, fy: 60, confinement: "spiral", cover: 1.5, layout: { type: "circle", size: "#8", n: 8 } });
    const qs = computeQuantities(sp, { lu: 180 }, { alongH: 0, alongB: 0 });
    const d = 20 - 3 - 0.375;
    const turns = 180 / sp.tie.spacing + 3;
    expect(qs.hoopLength).toBeCloseTo(turns * Math.hypot(Math.PI * d, sp.tie.spacing), 9);
    expect(qs.round).toBe(true);
    expect(qs.formFt2).toBeCloseTo((Math.PI * 20 * 180) / 144, 12);
    expect(qs.crossTies).toBe(0);
  });
});

describe("computeCost / computeCarbon", () => {
  const s = resolveSection({ shape: "rect", b: 18, h: 22, fc: 5, fy: 60, confinement: "tied", cover: 1.5, layout: { type: "perimeter", size: "#8", nb: 3, nh: 4 } });
  const q = computeQuantities(s, { lu: 204 }, countCrossTies(s));

  it("every line is quantity × unit price and the lines add up to the breakdown and total", () => {
    const c = computeCost(q, 5, 2, PRICES);
    for (const l of c.lines) expect(l.amount).toBeCloseTo(l.quantity * l.unitPrice, 9);
    const sum = c.lines.reduce((a, l) => a + l.amount, 0);
    expect(c.total).toBeCloseTo(sum, 9);
    expect(c.breakdown.concrete).toBeCloseTo(q.concreteYd3 * 200, 9);
    expect(c.breakdown.steel).toBeCloseTo(q.steelLb * 1.15, 9);
    expect(c.breakdown.formwork).toBeCloseTo(q.formFt2 * 13.5, 9);
    expect(c.breakdown.bracing).toBe(2 * 2400);
    expect(c.lines.map((l) => l.unit)).toEqual(["yd3", "lb", "lb", "lb", "ft2", "each"]);
  });

  it("a missing concrete price for the section's f'c is an error", () => {
    expect(() => computeCost(q, 6, 0, PRICES)).toThrow(RangeError);
    expect(lookupByStrength({ "5.0": 3 }, 5, "t")).toBe(3);
  });

  it("carbon: yd³ × factor for that f'c + lb × factor", () => {
    const c = computeCarbon(q, 5, { concrete: { "5": 290 }, steel: 0.4 });
    expect(c.concrete).toBeCloseTo(q.concreteYd3 * 290, 9);
    expect(c.steel).toBeCloseTo(q.steelLb * 0.4, 9);
    expect(c.total).toBeCloseTo(c.concrete + c.steel, 9);
  });

  it("checkResolved carries quantities always and cost / carbon when given", () => {
    const member = { lu: 204, kx: 1, ky: 1, braced: true };
    const loads = [{ name: "A", Pu: 200, betaDns: 0.5, Mx: { M1: 100, M2: 300, curvature: "double" as const } }];
    const bare = checkResolved(s, member, loads);
    expect(bare.quantities).toMatchObject({ ties: 14, crossTies: 14 });
    expect(bare.cost).toBeUndefined();
    const priced = checkResolved(s, member, loads, {}, { prices: PRICES, carbon: { concrete: { "5": 290 }, steel: 0.4 } });
    expect(priced.cost!.total).toBeGreaterThan(0);
    expect(priced.carbon!.total).toBeGreaterThan(0);
  });
});
