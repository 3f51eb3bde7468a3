import { describe, expect, it } from "vitest";
import {
  caseUtilization,
  checkMember,
  checkResolved,
  circleCapacityAt,
  governingUtilization,
  phiMnAt,
  phiMnAtAngle,
  prepareMember,
  resolveSection,
  type AxisResult,
  type CheckInput,
  type LoadCase,
  type MemberInput,
  type SectionInput,
} from "@/engine";

const RECT: SectionInput = {
  shape: "rect", b: 16, h: 22, fc: 5, fy: 60, confinement: "tied", cover: 1.5,
  layout: { type: "perimeter", size: "#8", nb: 3, nh: 4 },
};
const BRACED: MemberInput = { lu: 216, kx: 1, ky: 1, braced: true };
const L = (over: Partial<LoadCase> = {}): LoadCase => ({
  name: "U", Pu: 300, betaDns: 0.5, Mx: { M1: 600, M2: 1400, curvature: "single" }, ...over,
});
const AXIS_FIELDS: (keyof AxisResult)[] = ["klur", "limit", "slender", "EI", "Pc", "Cm", "delta", "M2", "Mc", "phiMn", "ratio"];

describe("checkMember: both axes, M2,min one axis at a time (column-checks.md §7.1, §7.2)", () => {
  it("results swap between x and y when b and h (and the layout, loads and lengths) swap", () => {
    const a: CheckInput = {
      section: RECT,
      member: { lu: 216, lux: 216, luy: 180, kx: 1, ky: 0.9, braced: true },
      loads: [L({ My: { M1: 100, M2: 450, curvature: "double" } }), L({ name: "V", Pu: 520, Mx: { M1: 0, M2: 300, curvature: "single" } })],
    };
    const b: CheckInput = {
      section: { ...RECT, b: 22, h: 16, layout: { type: "perimeter", size: "#8", nb: 4, nh: 3 } },
      member: { lu: 216, lux: 180, luy: 216, kx: 0.9, ky: 1, braced: true },
      loads: a.loads.map((l) => ({ ...l, Mx: l.My ?? { M1: 0, M2: 0, curvature: "double" }, My: l.Mx })),
    };
    const ra = checkMember(a);
    const rb = checkMember(b);
    expect(rb.utilization!).toBeCloseTo(ra.utilization!, 6);
    ra.cases.forEach((ca, i) => {
      const cb = rb.cases[i]!;
      for (const f of AXIS_FIELDS) {
        const va = ca.x[f];
        const vb = cb.y[f];
        if (typeof va === "number" && typeof vb === "number") expect(vb).toBeCloseTo(va, 5);
        else expect(vb).toBe(va);
        const wa = ca.y[f];
        const wb = cb.x[f];
        if (typeof wa === "number" && typeof wb === "number") expect(wb).toBeCloseTo(wa, 5);
        else expect(wb).toBe(wa);
      }
      expect(cb.m2min ?? null).toBe(ca.m2min === "x" ? "y" : ca.m2min === "y" ? "x" : null);
    });
  });

  it("an absent My still gets the y slenderness check; no end moment means M1/M2 = −1 (limit 22)", () => {
    const r = checkMember({ section: RECT, member: BRACED, loads: [L()] });
    const y = r.cases[0]!.y;
    expect(y.klur).toBeCloseTo(216 / (0.3 * 16), 12);
    expect(y.limit).toBe(22);
    expect(y.slender).toBe(true);
  });

  it("the worse of (x raised, y as given) and (x as given, y raised) governs", () => {
    const sec = resolveSection(RECT);
    // small moments: both axes below their minimum (M2,min x = 300 (0.6 + 0.66) = 378, y = 300 (0.6 + 0.48) = 324)
    const load = L({ Mx: { M1: 50, M2: 100, curvature: "single" }, My: { M1: 20, M2: 60, curvature: "double" } });
    const c = checkResolved(sec, BRACED, [load]).cases[0]!;
    expect(c.m2min === "x" || c.m2min === "y").toBe(true);
    const raised = c.m2min === "x" ? c.x : c.y;
    const given = c.m2min === "x" ? c.y : c.x;
    expect(raised.M2).toBeCloseTo(c.m2min === "x" ? 378 : 324, 9);
    expect(raised.Cm).toBe(1);
    expect(given.M2).toBe(c.m2min === "x" ? 60 : 100); // the other axis keeps its own first-order moment
    // both variants are biaxial: re-derive each with the capacity in its resultant direction
    const ratioOf = (Mcx: number, Mcy: number) => Math.hypot(Mcx, Mcy) / phiMnAtAngle(sec, 300, Math.atan2(Mcy, Mcx))!.phiMn;
    const dx = (Cm: number, Pc: number) => Math.max(1, Cm / (1 - 300 / (0.75 * Pc)));
    const PcX = c.x.Pc!; // EI (b) does not depend on the moment, so Pc is the same in both variants
    const PcY = c.y.Pc!;
    const CmX = 0.6 - 0.4 * (-50 / 100);
    const CmY = 0.6 - 0.4 * (20 / 60);
    const vX = ratioOf(dx(1, PcX) * 378, dx(CmY, PcY) * 60);
    const vY = ratioOf(dx(CmX, PcX) * 100, dx(1, PcY) * 324);
    expect(c.utilization!).toBeCloseTo(Math.max(vX, vY, 300 / sec.phiPnMax), 6);
    // the reported variant is one of the two, with its own biaxial ratio
    expect(c.biaxial!.ratio).toBeCloseTo(c.m2min === "x" ? vX : vY, 6);
    // the larger moment ratio is reported, also when Pu/φPn,max ties both variants
    expect(c.m2min).toBe(vX >= vY ? "x" : "y");
    expect(c.reasons.some((t) => t.includes("M2,min"))).toBe(true);
  });
});

describe("checkMember: slenderness neglected, δ, unstable, axial limit", () => {
  it("a short column: δ = 1, EI/Pc/Cm null, Mc = M2, and the reason says why", () => {
    const r = checkMember({ section: RECT, member: { lu: 96, kx: 1, ky: 1, braced: true }, loads: [L({ My: { M1: 100, M2: 200, curvature: "double" } })] });
    const c = r.cases[0]!;
    for (const a of [c.x, c.y]) {
      expect(a.slender).toBe(false);
      expect(a.delta).toBe(1);
      expect(a.EI).toBeNull();
      expect(a.Pc).toBeNull();
      expect(a.Cm).toBeNull();
      expect(a.Mc).toBe(a.M2);
    }
    expect(c.x.M2).toBe(1400); // no M2,min on a non-slender axis (§7.1)
    expect(c.reasons.filter((t) => t.startsWith("slenderness neglected")).length).toBe(2);
  });

  it("δ ≥ 1 for every stable case", () => {
    const sec = resolveSection(RECT);
    for (let i = 0; i < 12; i++) {
      const load = L({ Pu: 50 + 40 * i, Mx: { M1: 40 * i, M2: 500 + 40 * i, curvature: i % 2 ? "single" : "double" } });
      const c = checkResolved(sec, BRACED, [load]).cases[0]!;
      for (const a of [c.x, c.y]) if (a.delta !== null) expect(a.delta).toBeGreaterThanOrEqual(1);
    }
  });

  it("Pu ≥ 0.75 Pc is unstable: utilization and δ null, the reason quotes Pu and 0.75 Pc", () => {
    const member = { lu: 480, kx: 1, ky: 1, braced: true };
    const c = checkMember({ section: RECT, member, loads: [L({ Pu: 700 })] }).cases[0]!;
    expect(c.utilization).toBeNull();
    expect(c.pass).toBe(false);
    const ax = c.reasons[0]!.includes("about y") ? c.y : c.x;
    expect(ax.delta).toBeNull();
    expect(ax.ratio).toBeNull();
    expect(700).toBeGreaterThanOrEqual(0.75 * ax.Pc!);
    expect(c.reasons[0]).toMatch(/^unstable about [xy]: Pu = 700\.0 kip ≥ 0\.75 Pc = [\d.]+ kip \(6\.6\.4\.5\.2\)$/);
  });

  it("Pu above φPn,max fails with null utilization and φMn 0", () => {
    const sec = resolveSection(RECT);
    const r = checkResolved(sec, BRACED, [L({ Pu: sec.phiPnMax + 1 })]);
    expect(r.cases[0]!.utilization).toBeNull();
    expect(r.cases[0]!.x.phiMn).toBe(0);
    expect(r.cases[0]!.reasons[0]).toMatch(/exceeds φPn,max/);
    expect(r.pass).toBe(false);
    expect(r.utilization).toBeNull();
    expect(r.governing).toBe("U");
  });

  it("zero and tension axial load: no magnification, no M2,min, capacity in tension", () => {
    const sec = resolveSection(RECT);
    const [zero, tension] = checkResolved(sec, BRACED, [L({ name: "z", Pu: 0 }), L({ name: "t", Pu: -100 })]).cases;
    for (const c of [zero!, tension!]) {
      expect(c.x.delta).toBe(1);
      expect(c.m2min).toBeNull();
      expect(c.x.M2).toBe(1400);
      expect(c.utilization!).toBeCloseTo(1400 / phiMnAt(sec, "x", c.Pu)!.phiMn, 12);
    }
    const beyond = checkResolved(sec, BRACED, [L({ Pu: -0.9 * sec.Pnt - 1 })]).cases[0]!;
    expect(beyond.utilization).toBeNull();
    expect(beyond.reasons[0]).toMatch(/tension/);
  });

  it("utilization = max(Pu/φPn,max, Mc/φMn(Pu)) for a uniaxial case (§5)", () => {
    const sec = resolveSection(RECT);
    const member = { lu: 216, luy: 60, kx: 1, ky: 1, braced: true }; // y not slender: uniaxial
    const c = checkResolved(sec, member, [L()]).cases[0]!;
    expect(c.biaxial).toBeNull();
    const cap = phiMnAt(sec, "x", 300)!.phiMn;
    expect(c.x.phiMn).toBeCloseTo(cap, 9);
    expect(c.utilization!).toBeCloseTo(Math.max(300 / sec.phiPnMax, c.x.Mc / cap), 12);
    expect(c.y.Mc).toBe(0);
    expect(c.y.ratio).toBe(0);
  });
});

describe("checkMember: biaxial (§7.4) and circles (§7.5)", () => {
  it("rectangle: the resultant magnified moment against φMn in its direction", () => {
    const sec = resolveSection(RECT);
    const c = checkResolved(sec, { lu: 120, kx: 1, ky: 1, braced: true }, [L({ My: { M1: 200, M2: 800, curvature: "double" } })]).cases[0]!;
    expect(c.biaxial).not.toBeNull();
    const b = c.biaxial!;
    const theta = Math.atan2(b.Mcy, b.Mcx);
    expect(b.theta).toBeCloseTo((theta * 180) / Math.PI, 12);
    expect(b.phiMn).toBeCloseTo(phiMnAtAngle(sec, 300, theta)!.phiMn, 6); // the solver warm-starts: equal to ~1e-12 relative
    expect(b.ratio).toBeCloseTo(Math.hypot(b.Mcx, b.Mcy) / b.phiMn, 12);
    expect(c.utilization!).toBeCloseTo(Math.max(b.ratio, 300 / sec.phiPnMax), 12);
  });

  it("circle: one capacity in every direction, the smaller of two orientations (circleCapacityAt)", () => {
    const sec = resolveSection({ shape: "circle", D: 22, fc: 5, fy: 60, confinement: "tied", cover: 1.5, layout: { type: "circle", size: "#8", n: 8 } });
    const c = checkResolved(sec, { lu: 200, kx: 1, ky: 1, braced: true }, [L({ My: { M1: 100, M2: 900, curvature: "single" } })]).cases[0]!;
    const cap = circleCapacityAt(sec, 300)!.phiMn;
    expect(c.x.phiMn).toBeCloseTo(cap, 9);
    expect(c.y.phiMn).toBeCloseTo(cap, 9);
    expect(c.biaxial!.phiMn).toBeCloseTo(cap, 9);
    expect(c.biaxial!.ratio).toBeCloseTo(Math.hypot(c.x.Mc, c.y.Mc) / cap, 12);
  });

  it("Bresler's value is reported beside the biaxial check on request (comparison only)", () => {
    const c = checkMember({ section: RECT, member: { lu: 120, kx: 1, ky: 1, braced: true }, options: { bresler: true }, loads: [L({ My: { M1: 200, M2: 800, curvature: "double" } })] }).cases[0]!;
    expect(typeof c.biaxial!.bresler).toBe("number");
  });
});

describe("checkMember: brace levels, transverse load, lux / luy", () => {
  it("one brace level halves ℓu, reports the governing segment (0 = bottom) and a brace note", () => {
    const member = { ...BRACED, braceLevels: 1 };
    const r = checkMember({ section: RECT, member, loads: [L()] });
    const c = r.cases[0]!;
    expect(c.x.klur).toBeCloseTo(108 / 6.6, 12);
    expect(c.segment).toBe(1); // the top half carries M2 = 1400 in single curvature
    expect(r.reasons.some((t) => /brace/.test(t) && /1–2 %/.test(t))).toBe(true);
    const noBrace = checkMember({ section: RECT, member: BRACED, loads: [L()] });
    expect(c.utilization!).toBeLessThanOrEqual(noBrace.cases[0]!.utilization! + 1e-12);
  });

  it("transverse load between supports gives Cm = 1.0 (6.6.4.5.3(b)), per axis when an object", () => {
    const r = checkMember({ section: RECT, member: { ...BRACED, transverseLoad: true }, loads: [L()] });
    expect(r.cases[0]!.x.Cm).toBe(1);
    const r2 = checkMember({ section: RECT, member: { ...BRACED, transverseLoad: { y: true } }, loads: [L({ My: { M1: 300, M2: 900, curvature: "double" } })] });
    expect(r2.cases[0]!.x.Cm).toBeCloseTo(0.6 + 0.4 * (600 / 1400), 12);
    expect(r2.cases[0]!.y.Cm).toBe(1);
  });

  it("when Pu/φPn,max governs every segment, the segment with the larger moment ratio is reported", () => {
    const c = checkMember({ section: RECT, member: { lu: 120, kx: 1, ky: 1, braced: true, braceLevels: 1 }, loads: [L({ Pu: 900, Mx: { M1: 50, M2: 150, curvature: "single" } })] }).cases[0]!;
    expect(c.utilization!).toBeCloseTo(900 / resolveSection(RECT).phiPnMax, 12);
    expect(c.segment).toBe(1);
  });

  it("lux / luy replace ℓu for their axis", () => {
    const c = checkMember({ section: RECT, member: { lu: 216, lux: 300, luy: 100, kx: 1, ky: 1, braced: true }, loads: [L()] }).cases[0]!;
    expect(c.x.klur).toBeCloseTo(300 / 6.6, 12);
    expect(c.y.klur).toBeCloseTo(100 / 4.8, 12);
  });
});

describe("checkMember: sway columns (6.6.4.6, §7.14)", () => {
  const swayMember: MemberInput = { lu: 168, kx: 1.5, ky: 1.5, braced: false, sway: { x: { Q: 0.09 }, y: { sumPu: 5200, sumPc: 41000 } } };

  it("M = Mns + δs·Ms at each end, then the nonsway check along the length", () => {
    const load = L({ Mx: { M1: 200, M2: 400, curvature: "double", M1s: 300, M2s: 500 } });
    const c = checkMember({ section: RECT, member: swayMember, loads: [load] }).cases[0]!;
    const ds = 1 / (1 - 0.09);
    expect(c.x.deltaS!).toBeCloseTo(ds, 12);
    expect(c.x.limit).toBe(22);
    expect(c.x.klur).toBeCloseTo((1.5 * 168) / 6.6, 12);
    expect(c.x.M2).toBeCloseTo(Math.max(400 + ds * 500, 200 + ds * 300), 9);
    expect(c.y.deltaS!).toBeCloseTo(1 / (1 - 5200 / (0.75 * 41000)), 12);
    // along the length k = 1.0 in Pc (assumption stated in the output)
    expect(c.x.Pc!).toBeCloseTo((Math.PI ** 2 * c.x.EI!) / 168 ** 2, 6);
  });

  it("a slender sway column without stability data fails with that reason", () => {
    const r = checkMember({ section: RECT, member: { lu: 168, kx: 1.5, ky: 1.5, braced: false }, loads: [L()] });
    expect(r.pass).toBe(false);
    expect(r.cases[0]!.utilization).toBeNull();
    expect(r.cases[0]!.reasons[0]).toMatch(/no story stability data/);
  });

  it("the Q method is refused beyond δs = 1.5", () => {
    const r = checkMember({ section: RECT, member: { ...swayMember, sway: { x: { Q: 0.4 }, y: { Q: 0.05 } } }, loads: [L()] });
    expect(r.cases[0]!.reasons[0]).toMatch(/> 1\.5/);
    expect(r.cases[0]!.x.deltaS).toBeNull();
  });
});

describe("checkMember: pass/fail, governing, detailing, errors", () => {
  it("member utilization is the largest case utilization and names the governing case", () => {
    const r = checkMember({ section: RECT, member: { ...BRACED, luy: 150 }, loads: [L({ name: "a", Pu: 150 }), L({ name: "b", Pu: 450 }), L({ name: "c", Pu: 300 })] });
    expect(r.cases.every((c) => c.utilization !== null)).toBe(true);
    const max = Math.max(...r.cases.map((c) => c.utilization!));
    expect(r.utilization).toBe(max);
    expect(r.governing).toBe(r.cases.find((c) => c.utilization === max)!.name);
  });

  it("a detailing failure makes the member fail even when every case passes", () => {
    const r = checkMember({ section: RECT, member: BRACED, options: { rhoMax: 0.015 }, loads: [L({ Pu: 100, Mx: { M1: 0, M2: 300, curvature: "single" } })] });
    expect(r.cases.every((c) => c.pass)).toBe(true);
    expect(r.pass).toBe(false);
    expect(r.reasons[0]).toMatch(/rho-max/);
  });

  it("carries the code edition, assumptions and the caution", () => {
    const r = checkMember({ section: RECT, member: BRACED, loads: [L()] });
    expect(r.assumptions).toMatchObject({ code: "ACI 318-19", ei: "b", braced: true, kx: 1, ky: 1 });
    expect(r.assumptions.caution).toMatch(/licensed engineer/);
  });

  it("caseUtilization and governingUtilization give the same numbers as checkResolved", () => {
    const sec = resolveSection(RECT);
    const loads = [L({ name: "a", Pu: 150 }), L({ name: "b", Pu: 450, My: { M1: 10, M2: 200, curvature: "single" } }), L({ name: "c", Pu: 300 })];
    const member = { ...BRACED, luy: 150 };
    const full = checkResolved(sec, member, loads);
    const prep = prepareMember(sec, member);
    expect(full.cases.every((c) => c.utilization !== null)).toBe(true);
    // identical bits: no solver state carries over from one call to the next
    loads.forEach((l, i) => expect(caseUtilization(prep, l)).toBe(full.cases[i]!.utilization!));
    const g = governingUtilization(prep, loads, Infinity, 2);
    expect(g.utilization).toBe(full.utilization!);
    expect(loads[g.index]!.name).toBe(full.governing);
    const early = governingUtilization(prep, loads, 0.01, 0);
    expect(early.utilization).toBeGreaterThan(0.01);
    expect(early.index).toBe(0);
  });

  it("a biaxial case's utilization does not depend on the cases checked before it", () => {
    const sec = resolveSection({
      shape: "rect", b: 18, h: 28, fc: 4, fy: 60, confinement: "tied", cover: 1.5,
      layout: { type: "perimeter", size: "#9", nb: 5, nh: 4 },
    });
    const member: MemberInput = { lu: 240, kx: 1, ky: 1, braced: true };
    const loads: LoadCase[] = [];
    for (let i = 0; i < 8; i++) {
      loads.push(L({
        name: `c${i}`, Pu: 120 + 95 * i,
        Mx: { M1: 200 + 40 * i, M2: 900 + 110 * i, curvature: i % 2 ? "double" : "single" },
        My: { M1: 50 + 10 * i, M2: 300 + 70 * i, curvature: "single" },
      }));
    }
    const alone = loads.map((l) => checkResolved(resolveSection({
      shape: "rect", b: 18, h: 28, fc: 4, fy: 60, confinement: "tied", cover: 1.5,
      layout: { type: "perimeter", size: "#9", nb: 5, nh: 4 },
    }), member, [l]).cases[0]!.utilization);
    const forward = checkResolved(sec, member, loads).cases.map((c) => c.utilization);
    const backward = checkResolved(sec, member, [...loads].reverse()).cases.map((c) => c.utilization).reverse();
    expect(forward).toEqual(alone);
    expect(backward).toEqual(alone);
  });

  it("an unsymmetric section is checked in both senses (§7.3): φMn is the smaller", () => {
    const sec = resolveSection({
      shape: "rect", b: 16, h: 22, fc: 5, fy: 60, confinement: "tied", cover: 1.5,
      bars: [{ x: -5.6, y: 8.6, size: "#10" }, { x: 5.6, y: 8.6, size: "#10" }, { x: 5.6, y: -8.6, size: "#6" }, { x: -5.6, y: -8.6, size: "#6" }],
    });
    const c = checkResolved(sec, { lu: 96, kx: 1, ky: 1, braced: true }, [L()]).cases[0]!;
    const both = Math.min(phiMnAt(sec, "x", 300, 1)!.phiMn, phiMnAt(sec, "x", 300, -1)!.phiMn);
    expect(c.x.phiMn).toBeCloseTo(both, 9);
    expect(phiMnAt(sec, "x", 300, 1)!.phiMn).not.toBeCloseTo(phiMnAt(sec, "x", 300, -1)!.phiMn, 3);
  });

  it("invalid input throws RangeError; an infeasible design does not", () => {
    expect(() => checkMember({ section: { ...RECT, layout: undefined, bars: [{ x: 20, y: 0, size: "#8" }] }, member: BRACED, loads: [L()] })).toThrow(RangeError);
    expect(() => checkMember({ section: RECT, member: { ...BRACED, lu: 0 }, loads: [L()] })).toThrow(RangeError);
    expect(() => checkMember({ section: RECT, member: BRACED, loads: [L({ Mx: { M1: 900, M2: 100, curvature: "single" } })] })).toThrow(/M1 must not exceed M2/);
    expect(() => checkMember({ section: RECT, member: { lu: 200, kx: 1.2, ky: 1.2, braced: false, braceLevels: 1 }, loads: [L()] })).toThrow(RangeError);
    expect(() => checkMember({ section: RECT, member: BRACED, loads: [] })).toThrow(RangeError);
    expect(() => checkMember({ section: RECT, member: BRACED, loads: [L({ Pu: Number.NaN })] })).toThrow(/loads\.0\.Pu/);
    expect(() => checkMember({ section: { ...RECT, fy: 90 }, member: BRACED, loads: [L()] })).toThrow(/80 ksi/);
    expect(() => checkMember({ section: RECT, member: BRACED, loads: [L({ Pu: 5000 })] })).not.toThrow();
  });
});
