import { describe, expect, it } from "vitest";
import {
  checkBarCount,
  checkClearSpacing,
  checkCover,
  checkDetailing,
  checkSpiral,
  checkSteelRatio,
  checkTies,
  computeMinClearSpacing,
  computeSpiralRatio,
  countCrossTies,
  maxTieSpacing,
  minimumCover,
  resolveSection,
  type SectionInput,
} from "@/engine";

const rect = (over: Partial<SectionInput> = {}): SectionInput => ({
  shape: "rect", b: 18, h: 22, fc: 5, fy: 60, confinement: "tied", cover: 1.5,
  layout: { type: "perimeter", size: "#8", nb: 3, nh: 4 }, ...over,
});

describe("checkSteelRatio (10.6.1.1)", () => {
  it("1 % ≤ ρ ≤ 8 %, rhoMax lowers the cap", () => {
    const s = resolveSection(rect()); // 10 #8 = 7.90 in² / 396 in² = 0.01995
    const [min, max] = checkSteelRatio(s);
    expect(min).toMatchObject({ rule: "rho-min", clause: "10.6.1.1", ok: true, limit: 0.01 });
    expect(min!.value).toBeCloseTo(7.9 / 396, 12);
    expect(max).toMatchObject({ rule: "rho-max", ok: true, limit: 0.08 });
    expect(checkSteelRatio(s, 0.015)[1]).toMatchObject({ ok: false, limit: 0.015 });
    const light = resolveSection(rect({ layout: { type: "perimeter", size: "#5", nb: 2, nh: 2 } })); // 4 #5 = 1.24 in²
    expect(checkSteelRatio(light)[0]!.ok).toBe(false);
    expect(checkSteelRatio(light)[0]!.message).toMatch(/below the minimum 0\.01/);
  });
});

describe("checkBarCount (10.7.3.1)", () => {
  it("≥ 4 bars with ties, ≥ 6 with a spiral", () => {
    expect(checkBarCount(resolveSection(rect({ layout: { type: "perimeter", size: "#9", nb: 2, nh: 2 } })))).toMatchObject({ ok: true, value: 4, limit: 4 });
    const sp = resolveSection({ shape: "circle", D: 20, fc: 5, fy: 60, confinement: "spiral", cover: 1.5, layout: { type: "circle", size: "#8", n: 5 } });
    expect(checkBarCount(sp)).toMatchObject({ ok: false, value: 5, limit: 6 });
  });
});

describe("checkClearSpacing (25.2.3)", () => {
  it("limit max(1.5 in, 1.5 db, 4/3 dagg) with the largest bar; value the smallest clear gap", () => {
    const s = resolveSection(rect());
    // faces of width h: 4 bars over 2·(11 − 1.5 − 0.375 − 0.5) = 17.25 in → 5.75 in c/c, 4.75 in clear
    expect(computeMinClearSpacing(s)).toBeCloseTo(4.75, 10);
    expect(checkClearSpacing(s, 0.75)).toMatchObject({ ok: true, limit: 1.5, unit: "in" });
    expect(checkClearSpacing(s, 1.5).limit).toBeCloseTo(2, 12); // 4/3 × 1.5 in
    const big = resolveSection(rect({ layout: { type: "perimeter", size: "#11", nb: 3, nh: 4 } }));
    expect(checkClearSpacing(big).limit).toBeCloseTo(1.5 * 1.41, 12);
    const crowded = resolveSection(rect({ b: 12, h: 12, layout: { type: "perimeter", size: "#10", nb: 5, nh: 5 } }));
    const r = checkClearSpacing(crowded);
    expect(r.ok).toBe(false);
    expect(r.message).toMatch(/less than/);
    expect(checkClearSpacing(crowded, 0.75, "SI").message).toMatch(/mm is less than 48\.4 mm/); // 1.5 × 1.27 in = 1.905 in
    expect(checkDetailing(crowded, { displayUnits: "SI" }).rules.find((x) => x.rule === "clear-spacing")!.message).toMatch(/ mm /);
  });

  it("uses the largest bar when sizes are mixed (column-checks.md §7.10)", () => {
    const s = resolveSection({
      shape: "rect", b: 20, h: 20, fc: 5, fy: 60, confinement: "tied", cover: 1.5,
      bars: [
        { x: -7, y: 7, size: "#11" }, { x: 7, y: 7, size: "#6" }, { x: 7, y: -7, size: "#6" }, { x: -7, y: -7, size: "#6" },
      ],
    });
    expect(checkClearSpacing(s).limit).toBeCloseTo(1.5 * 1.41, 12);
  });
});

describe("checkCover (Table 20.5.1.3.1)", () => {
  it("1.5 in interior, 2 in exposed with #6 and larger (1.5 in #5 and smaller), 3 in against earth", () => {
    expect(minimumCover("interior", 1.0)).toBe(1.5);
    expect(minimumCover("exposed", 1.0)).toBe(2);
    expect(minimumCover("exposed", 0.625)).toBe(1.5);
    expect(minimumCover("earth", 0.625)).toBe(3);
    const s = resolveSection(rect());
    expect(checkCover(s, "interior").ok).toBe(true);
    expect(checkCover(s, "exposed")).toMatchObject({ ok: false, value: 1.5, limit: 2 });
  });
});

describe("checkTies (25.7.2.1, 25.7.2.2)", () => {
  it("derived ties are reported: #3 for #8 bars, s = min(16 db, 48 dtie, least dimension)", () => {
    const s = resolveSection(rect());
    const [size, spacing] = checkTies(s);
    expect(size).toMatchObject({ rule: "tie-size", ok: true, value: 0.375, limit: 0.375 });
    expect(size!.message).toMatch(/derived #3/);
    expect(maxTieSpacing(s, 0.375)).toBeCloseTo(Math.min(16 * 1.0, 48 * 0.375, 18), 12);
    expect(spacing).toMatchObject({ rule: "tie-spacing", ok: true, value: 16 });
  });

  it("given ties are checked: #3 with #11 bars fails (needs #4); spacing over the limit fails", () => {
    const s = resolveSection(rect({ layout: { type: "perimeter", size: "#11", nb: 3, nh: 3 }, tie: { size: "#3", spacing: 20 } }));
    const [size, spacing] = checkTies(s);
    expect(size).toMatchObject({ ok: false, limit: 0.5 });
    expect(spacing!.ok).toBe(false);
    expect(spacing!.limit).toBeCloseTo(Math.min(16 * 1.41, 48 * 0.375, 18), 12);
  });

  it("16 db uses the smallest longitudinal bar (column-checks.md §7.10)", () => {
    const s = resolveSection({
      shape: "rect", b: 24, h: 24, fc: 5, fy: 60, confinement: "tied", cover: 1.5,
      bars: [{ x: -9, y: 9, size: "#10" }, { x: 9, y: 9, size: "#10" }, { x: 9, y: -9, size: "#5" }, { x: -9, y: -9, size: "#10" }],
    });
    expect(maxTieSpacing(s, 0.375)).toBeCloseTo(16 * 0.625, 12);
  });
});

describe("countCrossTies (25.7.2.3, column-checks.md §7.11)", () => {
  it("3 bars on a face with ≤ 6 in clear: the middle bar may stay unsupported; > 6 in: held", () => {
    const s = resolveSection(rect({ layout: { type: "perimeter", size: "#8", nb: 3, nh: 3 } }));
    // face of width b: 2 × (9 − 2.375) = 13.25 in between corners, 6.625 in c/c, 5.625 in clear ≤ 6
    const c = countCrossTies(s);
    expect(c.alongH).toBe(0);
    expect(c.alongB).toBe(1); // face of width h: 2 × 8.625 / 2 = 8.625 in c/c, 7.625 in clear > 6 → needs one
  });

  it("a middle bar more than 6 in clear from the corners needs a cross-tie", () => {
    const s = resolveSection(rect({ b: 24, h: 24, layout: { type: "perimeter", size: "#8", nb: 3, nh: 3 } }));
    // 2 × (12 − 2.375) / 2 = 9.625 in c/c → 8.625 in clear > 6: the middle bars of all faces are held
    const c = countCrossTies(s);
    expect(c).toMatchObject({ alongH: 1, alongB: 1, perSet: 2 });
  });

  it("no two neighbouring bars unsupported: 4 bars on a face need one held interior bar", () => {
    const s = resolveSection(rect()); // nh = 4 on the faces of width h, 4.75 in clear
    expect(countCrossTies(s)).toMatchObject({ alongH: 0, alongB: 1 });
    // 5 close bars on a face: corners, alternate → the middle one held
    const five = resolveSection(rect({ b: 24, layout: { type: "perimeter", size: "#8", nb: 5, nh: 2 } }));
    expect(countCrossTies(five).alongH).toBe(1);
  });

  it("per pair of opposite faces the larger need governs; circles need none", () => {
    const s = resolveSection({
      shape: "rect", b: 30, h: 16, fc: 5, fy: 60, confinement: "tied", cover: 1.5,
      bars: [
        { x: -12, y: 5.5, size: "#8" }, { x: -4, y: 5.5, size: "#8" }, { x: 4, y: 5.5, size: "#8" }, { x: 12, y: 5.5, size: "#8" },
        { x: -12, y: -5.5, size: "#8" }, { x: 0, y: -5.5, size: "#8" }, { x: 12, y: -5.5, size: "#8" },
      ],
    });
    // top face: 8 in c/c (7 in clear > 6) → both interior bars held (2); bottom: 12 in → middle held (1)
    expect(countCrossTies(s).alongH).toBe(2);
    const circ = resolveSection({ shape: "circle", D: 24, fc: 5, fy: 60, confinement: "tied", cover: 1.5, layout: { type: "circle", size: "#8", n: 12 } });
    expect(countCrossTies(circ).perSet).toBe(0);
  });

  it("a bar inside the perimeter fails lateral support", () => {
    const s = resolveSection({
      shape: "rect", b: 20, h: 20, fc: 5, fy: 60, confinement: "tied", cover: 1.5,
      bars: [{ x: -7, y: 7, size: "#8" }, { x: 7, y: 7, size: "#8" }, { x: 7, y: -7, size: "#8" }, { x: -7, y: -7, size: "#8" }, { x: 0, y: 0, size: "#8" }],
    });
    const r = checkDetailing(s).rules.find((x) => x.rule === "lateral-support")!;
    expect(r.ok).toBe(false);
    expect(r.message).toMatch(/inside the perimeter/);
  });
});

describe("checkSpiral (25.7.3)", () => {
  const sp = resolveSection({ shape: "circle", D: 20, fc: 5, fy: 60, confinement: "spiral", cover: 1.5, layout: { type: "circle", size: "#8", n: 8 } });
  it("ρs ≥ 0.45 (Ag/Ach − 1) f'c/fyt with the derived pitch; clear pitch 1…3 in", () => {
    const { rho, rhoMin } = computeSpiralRatio(sp, 0.11);
    const Dch = 20 - 3;
    expect(rhoMin).toBeCloseTo(0.45 * ((20 * 20) / (Dch * Dch) - 1) * (5 / 60), 12);
    expect(rho).toBeCloseTo((4 * 0.11) / (Dch * sp.tie.spacing), 12);
    const rules = checkSpiral(sp, 0.11, 0.75);
    expect(rules.map((r) => r.rule)).toEqual(["spiral-ratio", "spiral-pitch-max", "spiral-pitch-min", "spiral-size"]);
    expect(rules[0]!.ok).toBe(true);
  });
  it("the soft-metric No. 10 spiral (9.5 mm) is the 3/8 in bar (25.7.3.2)", () => {
    const m = resolveSection({ shape: "circle", D: 20, fc: 5, fy: 60, confinement: "spiral", cover: 1.5, layout: { type: "circle", size: "25", n: 8 }, tie: { size: "10", spacing: 2 } });
    expect(checkSpiral(m, 71 / 645.16, 0.75).find((r) => r.rule === "spiral-size")!.ok).toBe(true);
  });
  it("a given pitch that is too open fails the ratio and the 3 in clear limit", () => {
    const open = resolveSection({ shape: "circle", D: 20, fc: 5, fy: 60, confinement: "spiral", cover: 1.5, layout: { type: "circle", size: "#8", n: 8 }, tie: { size: "#3", spacing: 4 } });
    const rules = checkSpiral(open, 0.11, 0.75);
    expect(rules[0]!.ok).toBe(false);
    expect(rules[1]).toMatchObject({ rule: "spiral-pitch-max", ok: false });
  });
});

describe("checkDetailing", () => {
  it("lists every rule of column-checks.md §4 for a tied section, all passing here", () => {
    const { rules } = checkDetailing(resolveSection(rect()), { dagg: 0.75 });
    expect(rules.map((r) => r.rule)).toEqual(["rho-min", "rho-max", "bar-count", "clear-spacing", "cover", "tie-size", "tie-spacing", "lateral-support"]);
    expect(rules.every((r) => r.ok)).toBe(true);
    for (const r of rules) expect(r.clause).toMatch(/^\d/);
  });
});
