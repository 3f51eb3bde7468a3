/**
 * Pareto fronts and the staircase of known points (column-checks.md §7.12): dominance on
 * cents and 1e-4 units, exact ties all kept, order cost → utilization → id. Checked against
 * the definition by brute force on random point sets.
 */
import { describe, expect, it } from "vitest";
import { dominates, selectFront, Staircase, toCents, toUtilUnits } from "../../optimizer/pareto-front";

/** Small deterministic generator (mulberry32) so failures can be replayed. */
function rng(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe("selectFront", () => {
  it("keeps exact ties, drops what is dominated, sorts by a, b, id", () => {
    const pts = [
      { id: "c", a: 100, b: 50 },
      { id: "a", a: 100, b: 50 },
      { id: "d", a: 100, b: 60 }, // same cost, worse utilization
      { id: "e", a: 120, b: 50 }, // dearer, no better
      { id: "f", a: 130, b: 40 },
      { id: "g", a: 90, b: 70 },
    ];
    expect(selectFront(pts).map((p) => p.id)).toEqual(["g", "a", "c", "f"]);
  });

  it("matches the definition on random sets", () => {
    const next = rng(7);
    for (let trial = 0; trial < 200; trial++) {
      const pts = Array.from({ length: 1 + Math.floor(next() * 40) }, (_, i) => ({ id: `p${i}`, a: Math.floor(next() * 12), b: Math.floor(next() * 12) }));
      const expected = pts
        .filter((p) => !pts.some((q) => dominates(q, p)))
        .sort((x, y) => x.a - y.a || x.b - y.b || (x.id < y.id ? -1 : 1))
        .map((p) => p.id);
      expect(selectFront(pts).map((p) => p.id)).toEqual(expected);
    }
  });

  it("rounds cost to cents and utilization to 1e-4 before comparing", () => {
    expect(toCents(1234.564999)).toBe(123456);
    expect(toCents(1234.565001)).toBe(123457);
    expect(toUtilUnits(0.97004)).toBe(9700);
    expect(toUtilUnits(0.97006)).toBe(9701);
    // 0.970049 and 0.97 tie at 1e-4: neither dominates the other at equal cost
    const a = { id: "a", a: 100, b: toUtilUnits(0.970049) };
    const b = { id: "b", a: 100, b: toUtilUnits(0.97) };
    expect(selectFront([a, b]).map((p) => p.id)).toEqual(["a", "b"]);
  });
});

describe("Staircase", () => {
  it("answers 'certainly dominated' exactly as a brute force over its points", () => {
    const next = rng(11);
    for (let trial = 0; trial < 100; trial++) {
      const s = new Staircase();
      const pts: Array<[number, number]> = [];
      for (let i = 0; i < 30; i++) {
        const p: [number, number] = [Math.floor(next() * 20), Math.floor(next() * 20)];
        pts.push(p);
        s.add(p[0], p[1]);
        for (let q = 0; q < 10; q++) {
          const a = Math.floor(next() * 22);
          const bLow = Math.floor(next() * 22);
          const brute = pts.some(([pa, pb]) => (pa < a && pb <= bLow) || (pa <= a && pb < bLow));
          expect(s.dominatesAll(a, bLow)).toBe(brute);
        }
      }
      // what it keeps is the front of what it was given
      const front = selectFront(pts.map(([a, b], i) => ({ id: String(i).padStart(3, "0"), a, b })));
      const kept = s.points();
      const distinct = [...new Map(front.map((p) => [`${p.a},${p.b}`, [p.a, p.b] as [number, number]])).values()];
      expect(kept).toEqual(distinct);
    }
  });
});
