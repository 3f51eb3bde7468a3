import { describe, expect, it } from "vitest";
import {
  checkResolved,
  computeCm,
  computeColumnInertia,
  computeCriticalLoad,
  computeEffectiveStiffness,
  computeEndMomentRatio,
  computeMinimumMoment,
  computeMomentMagnifier,
  computeRadiusOfGyration,
  computeSegmentEndMoments,
  computeSlendernessLimit,
  computeSwayMagnifier,
  resolveSection,
  type LoadCase,
  type MemberInput,
  type SectionInput,
} from "@/engine";

// A column of our own invention: 16 × 20 in, f'c 5 ksi, fy 60 ksi, 8 #9 (3 × 3 perimeter),
// 1.5 in cover, #3 ties; ℓu = 18 ft braced, k = 1; Pu = 400 kip with βdns = 0.6,
// Mx = 600 / 1200 kip-in in single curvature, no My.
const SECTION: SectionInput = {
  shape: "rect", b: 16, h: 20, fc: 5, fy: 60, confinement: "tied", cover: 1.5,
  layout: { type: "perimeter", size: "#9", nb: 3, nh: 3 },
};
const MEMBER: MemberInput = { lu: 216, kx: 1, ky: 1, braced: true };
const LOAD: LoadCase = { name: "U1", Pu: 400, betaDns: 0.6, Mx: { M1: 600, M2: 1200, curvature: "single" } };

describe("magnifier chain of an invented column, every step re-derived in closed form", () => {
  const sec = resolveSection(SECTION);
  // closed form: bar centres at cover + dtie + db/2 = 1.5 + 0.375 + 0.564 = 2.439 in from the faces (#9 db = 1.128 in, §4 table)
  const edge = 1.5 + 0.375 + 1.128 / 2;
  const yBar = 10 - edge;
  const xBar = 8 - edge;
  const Ise_x = 6 * 1.0 * yBar * yBar; // six #9 (1.00 in² each) at y = ±yBar, two at y = 0
  const Ise_y = 6 * 1.0 * xBar * xBar;
  const Igx = (16 * 20 ** 3) / 12; // b h³ / 12
  const Igy = (20 * 16 ** 3) / 12;
  const Ec = 57 * Math.sqrt(5000); // 19.2.2.1(b), psi form 57 000 √f'c → ksi
  const Es = 29000; // 20.2.2.2

  it("reproduces r, k ℓu/r, the limit, EI (b), Pc, Cm, δ, M2,min and Mc about x", () => {
    const out = checkResolved(sec, MEMBER, [LOAD], { ei: "b" });
    const x = out.cases[0]!.x;
    const r = 0.3 * 20; // 6.2.5.2
    const klur = (1 * 216) / r; // 36
    const m1m2 = -600 / 1200; // single curvature → negative (6.6.4.5.3, column-checks.md §3)
    const limit = Math.min(34 + 12 * m1m2, 40); // 6.2.5.1(b): 28
    const EI = (0.2 * Ec * Igx + Es * Ise_x) / (1 + 0.6); // 6.6.4.4.4(b)
    const Pc = (Math.PI ** 2 * EI) / (1 * 216) ** 2; // 6.6.4.4.2
    const Cm = 0.6 - 0.4 * m1m2; // 6.6.4.5.3(a): 0.8
    const delta = Math.max(1, Cm / (1 - 400 / (0.75 * Pc))); // 6.6.4.5.2
    const M2min = 400 * (0.6 + 0.03 * 20); // 6.6.4.5.4: 480 kip-in < 1200, does not govern
    expect(sec.Isex).toBeCloseTo(Ise_x, 9);
    expect(x.klur).toBeCloseTo(klur, 12);
    expect(x.limit).toBeCloseTo(limit, 12);
    expect(x.slender).toBe(true);
    expect(x.EI!).toBeCloseTo(EI, 3);
    expect(x.Pc!).toBeCloseTo(Pc, 6);
    expect(x.Cm!).toBeCloseTo(Cm, 12);
    expect(x.delta!).toBeCloseTo(delta, 10);
    expect(M2min).toBeLessThan(1200);
    expect(x.M2).toBe(1200);
    expect(x.Mc).toBeCloseTo(delta * 1200, 8); // 6.6.4.5.1
    expect(delta).toBeGreaterThan(1); // this column is magnified
  });

  it("about y (no My): slender, M2,min with Cm = 1.0 (§7.1, §7.2) — and δ > 1.4 fails the 6.2.5.3 cap", () => {
    const out = checkResolved(sec, MEMBER, [LOAD], { ei: "b" });
    const c = out.cases[0]!;
    const r = 0.3 * 16;
    const EIy = (0.2 * Ec * Igy + Es * Ise_y) / 1.6;
    const Pcy = (Math.PI ** 2 * EIy) / 216 ** 2;
    const M2min = 400 * (0.6 + 0.03 * 16); // 432 kip-in
    const deltaY = Math.max(1, 1 / (1 - 400 / (0.75 * Pcy)));
    expect(c.y.klur).toBeCloseTo(216 / r, 12);
    expect(c.y.limit).toBe(22); // M1/M2 = −1 with no end moment
    expect(c.m2min).toBe("y");
    expect(c.y.M2).toBeCloseTo(M2min, 10);
    expect(c.y.Cm).toBe(1);
    expect(c.y.Pc!).toBeCloseTo(Pcy, 6);
    expect(c.y.delta!).toBeCloseTo(deltaY, 10);
    expect(c.y.Mc).toBeCloseTo(deltaY * M2min, 8);
    // δy = 1/(1 − 400/(0.75·Pcy)) ≈ 1.59 > 1.4: the second-order moment exceeds 1.4 × first-order (6.2.5.3)
    expect(deltaY).toBeGreaterThan(1.4);
    expect(c.utilization).toBeNull();
    expect(c.pass).toBe(false);
    expect(c.biaxial).toBeNull();
    expect(c.reasons[0]).toMatch(/about y exceeds 1\.4 × the first-order moment.*6\.2\.5\.3/);
    expect(out.pass).toBe(false);
    expect(out.utilization).toBeNull();
  });

  it("EI options (a) and (c) follow 6.6.4.4.4 and Table 6.6.3.1.1(b)", () => {
    const a = checkResolved(sec, MEMBER, [LOAD], { ei: "a" }).cases[0]!.x;
    expect(a.EI!).toBeCloseTo((0.4 * Ec * Igx) / 1.6, 3);
    const c = checkResolved(sec, MEMBER, [LOAD], { ei: "c" }).cases[0]!.x;
    // I = (0.80 + 25 ρ)(1 − Mu/(Pu h) − 0.5 Pu/P0) Ig = 1.425 × 0.739 Ig > 0.875 Ig → capped
    const rho = 8 / 320;
    const P0 = 0.85 * 5 * (320 - 8) + 60 * 8; // 22.4.2.2
    const raw = (0.8 + 25 * rho) * (1 - 1200 / (400 * 20) - (0.5 * 400) / P0);
    expect(raw).toBeGreaterThan(0.875);
    expect(c.EI!).toBeCloseTo((Ec * 0.875 * Igx) / 1.6, 3);
  });
});

describe("slenderness pieces", () => {
  it("computeEndMomentRatio: single curvature negative, double positive, M2 = 0 → −1 (§3, §7.2)", () => {
    expect(computeEndMomentRatio(700, 1450, "single")).toBeCloseTo(-700 / 1450, 15);
    expect(computeEndMomentRatio(700, 1450, "double")).toBeCloseTo(700 / 1450, 15);
    expect(computeEndMomentRatio(0, 0, "double")).toBe(-1);
    expect(computeEndMomentRatio(0, 500, "single")).toBeCloseTo(0, 15);
  });

  it("computeSlendernessLimit: 34 + 12 M1/M2 ≤ 40 braced, 22 sway (6.2.5.1)", () => {
    expect(computeSlendernessLimit(true, -1)).toBe(22);
    expect(computeSlendernessLimit(true, 0)).toBe(34);
    expect(computeSlendernessLimit(true, 0.5)).toBe(40);
    expect(computeSlendernessLimit(true, 1)).toBe(40); // capped (6.2.5.1(c))
    expect(computeSlendernessLimit(false, 1)).toBe(22);
  });

  it("computeCm: 0.6 − 0.4 M1/M2, 1.0 with transverse load (6.6.4.5.3)", () => {
    expect(computeCm(-1, false)).toBeCloseTo(1, 15);
    expect(computeCm(1, false)).toBeCloseTo(0.2, 15);
    expect(computeCm(0.3, true)).toBe(1);
  });

  it("computeMomentMagnifier: δ ≥ 1 and null when Pu ≥ 0.75 Pc (6.6.4.5.2)", () => {
    expect(computeMomentMagnifier(0.4, 100, 10000)).toBe(1);
    expect(computeMomentMagnifier(1, 300, 1000)).toBeCloseTo(1 / (1 - 0.4), 14);
    expect(computeMomentMagnifier(1, 750, 1000)).toBeNull();
    expect(computeMomentMagnifier(1, 800, 1000)).toBeNull();
    for (let p = 0; p < 740; p += 37) {
      const d = computeMomentMagnifier(0.2 + p / 1000, p, 1000);
      expect(d).not.toBeNull();
      expect(d!).toBeGreaterThanOrEqual(1);
    }
  });

  it("computeMinimumMoment: Pu (0.6 + 0.03 h) with h in inches (6.6.4.5.4)", () => {
    expect(computeMinimumMoment(300, 20)).toBeCloseTo(360, 12);
    expect(computeMinimumMoment(0, 20)).toBe(0);
  });

  it("computeCriticalLoad: π² EI / (k ℓu)² (6.6.4.4.2)", () => {
    expect(computeCriticalLoad(1e7, 0.8, 200)).toBeCloseTo((Math.PI ** 2 * 1e7) / 160 ** 2, 8);
  });

  it("computeColumnInertia stays within 0.35 Ig … 0.875 Ig (Table 6.6.3.1.1(b))", () => {
    expect(computeColumnInertia(1000, 0.02, 100, 1e6, 20, 2000)).toBeCloseTo(350, 12);
    expect(computeColumnInertia(1000, 0.02, 0, 0, 20, 2000)).toBeCloseTo(350, 12);
    // mid-range: (0.8 + 0.5)(1 − 0.2 − 0.075) = 0.9425 → capped 0.875; with more moment:
    expect(computeColumnInertia(1000, 0.02, 300, 1200, 20, 2000)).toBeCloseTo(875, 12);
    expect(computeColumnInertia(1000, 0.02, 300, 2400, 20, 2000)).toBeCloseTo(1300 * (1 - 0.4 - 0.075), 10);
  });

  it("computeEffectiveStiffness (a), (b), (c) divide by 1 + βdns", () => {
    const base = { Ec: 4000, Es: 29000, Ig: 10000, Ise: 300, Ast: 8, Ag: 320, Pu: 300, Mu: 2400, h: 20, P0: 2000, betaDns: 0.5 };
    expect(computeEffectiveStiffness({ ...base, option: "a" })).toBeCloseTo((0.4 * 4000 * 10000) / 1.5, 6);
    expect(computeEffectiveStiffness({ ...base, option: "b" })).toBeCloseTo((0.2 * 4000 * 10000 + 29000 * 300) / 1.5, 6);
    const I = computeColumnInertia(10000, 8 / 320, 300, 2400, 20, 2000);
    expect(computeEffectiveStiffness({ ...base, option: "c" })).toBeCloseTo((4000 * I) / 1.5, 6);
  });

  it("computeRadiusOfGyration: 0.30 h, 0.25 D or √(Ig/Ag) (6.2.5.2)", () => {
    const sec = resolveSection(SECTION);
    expect(computeRadiusOfGyration(sec, "x")).toBeCloseTo(6, 14);
    expect(computeRadiusOfGyration(sec, "y")).toBeCloseTo(4.8, 14);
    expect(computeRadiusOfGyration(sec, "x", "gross")).toBeCloseTo(20 / Math.sqrt(12), 12);
    const circ = resolveSection({ shape: "circle", D: 24, fc: 5, fy: 60, confinement: "tied", cover: 1.5, layout: { type: "circle", size: "#8", n: 8 } });
    expect(computeRadiusOfGyration(circ, "y")).toBeCloseTo(6, 14);
    expect(computeRadiusOfGyration(circ, "x", "gross")).toBeCloseTo(6, 12); // √(πD⁴/64 ÷ πD²/4) = D/4
  });

  it("computeSwayMagnifier: 1/(1 − Q) only up to 1.5; ΣPu/ΣPc form; unstable story (6.6.4.6.2)", () => {
    expect(computeSwayMagnifier({ Q: 0.09 }).deltaS!).toBeCloseTo(1 / 0.91, 14);
    expect(computeSwayMagnifier({ Q: 0.4 }).deltaS).toBeNull(); // 1.667 > 1.5
    expect(computeSwayMagnifier({ Q: 1 }).deltaS).toBeNull();
    expect(computeSwayMagnifier({ sumPu: 5200, sumPc: 41000 }).deltaS!).toBeCloseTo(1 / (1 - 5200 / (0.75 * 41000)), 14);
    expect(computeSwayMagnifier({ sumPu: 31000, sumPc: 41000 }).deltaS).toBeNull();
  });
});

describe("segments between brace levels (column-checks.md §3, §7.8)", () => {
  it("one brace at mid-height in single curvature leaves two single-curvature segments with M1/M2 closer to −1", () => {
    const whole = computeEndMomentRatio(700, 1450, "single");
    const s0 = computeSegmentEndMoments(700, 1450, "single", 1, 0);
    const s1 = computeSegmentEndMoments(700, 1450, "single", 1, 1);
    expect(s0).toEqual({ M1: 700, M2: 1075, curvature: "single" });
    expect(s1).toEqual({ M1: 1075, M2: 1450, curvature: "single" });
    for (const s of [s0, s1]) {
      const r = computeEndMomentRatio(s.M1, s.M2, s.curvature);
      expect(r).toBeLessThan(whole);
      expect(r).toBeGreaterThanOrEqual(-1);
    }
  });

  it("double curvature: the segment holding the inflection point is in double curvature, the others single", () => {
    // line from −1000 (bottom) to +1000 (top): zero at mid-height
    const s = [0, 1, 2].map((i) => computeSegmentEndMoments(1000, 1000, "double", 2, i));
    expect(s[0]!.curvature).toBe("single");
    expect(s[0]!.M1).toBeCloseTo(1000 / 3, 10);
    expect(s[0]!.M2).toBeCloseTo(1000, 10);
    expect(s[1]!.curvature).toBe("double");
    expect(s[1]!.M1).toBeCloseTo(1000 / 3, 10);
    expect(s[1]!.M2).toBeCloseTo(1000 / 3, 10);
    expect(s[2]!.M2).toBeCloseTo(1000, 10);
  });

  it("no brace: the column's own end moments", () => {
    expect(computeSegmentEndMoments(1, 2, "double", 0, 0)).toEqual({ M1: 1, M2: 2, curvature: "double" });
  });
});
