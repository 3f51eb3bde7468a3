import { describe, expect, it } from "vitest";
import { resolveSection, rotateSection, measureCircularSegment, clipRectangleBlock } from "@/engine/section";
import { rectangleBlockInto } from "@/engine/section/clip-rectangle-block";
import type { SectionInput } from "@/engine/types";

const base: SectionInput = {
  shape: "rect", b: 18, h: 22, fc: 5, fy: 60, confinement: "tied", cover: 1.5,
  layout: { type: "perimeter", size: "#8", nb: 3, nh: 3 },
};

describe("resolveSection — rectangular perimeter layout", () => {
  const s = resolveSection(base);
  // edge distance = cover + tie + db/2 = 1.5 + 0.375 (#3, 25.7.2.2) + 0.5 = 2.375 in
  const xe = 9 - 2.375;
  const ye = 11 - 2.375;
  it("places 2 nb + 2 (nh − 2) bars at cover + tie + db/2 from the faces", () => {
    expect(s.bars).toHaveLength(8);
    const coords = s.bars.map((b) => [b.x, b.y]);
    expect(coords).toEqual([
      [-xe, ye], [0, ye], [xe, ye],
      [xe, 0],
      [xe, -ye], [0, -ye], [-xe, -ye],
      [-xe, 0],
    ]);
    for (const b of s.bars) {
      expect(b.size).toBe("#8");
      expect(b.area).toBe(0.79);
      expect(b.db).toBe(1);
    }
  });
  it("precomputes gross and steel properties (closed form)", () => {
    expect(s.Ag).toBe(18 * 22);
    expect(s.Ast).toBeCloseTo(8 * 0.79, 12);
    expect(s.rho).toBeCloseTo((8 * 0.79) / 396, 12);
    expect(s.Igx).toBeCloseTo((18 * 22 ** 3) / 12, 9);
    expect(s.Igy).toBeCloseTo((22 * 18 ** 3) / 12, 9);
    expect(s.Isex).toBeCloseTo(6 * 0.79 * ye * ye, 9);
    expect(s.Isey).toBeCloseTo(6 * 0.79 * xe * xe, 9);
    expect(s.Ec).toBeCloseTo(57 * Math.sqrt(5000), 9); // 19.2.2.1(b)
    expect(s.Es).toBe(29000); // 20.2.2.2
    expect(s.beta1).toBeCloseTo(0.8, 12); // Table 22.2.2.4.3
  });
  it("computes P0, Pn,max, φPn,max and Pnt (22.4.2.2, Table 22.4.2.1, 22.4.3.1)", () => {
    const P0 = 0.85 * 5 * (396 - 6.32) + 60 * 6.32;
    expect(s.P0).toBeCloseTo(P0, 9);
    expect(s.P0).toBeCloseTo(2035.34, 6);
    expect(s.PnMax).toBeCloseTo(0.8 * P0, 9);
    expect(s.phiPnMax).toBeCloseTo(0.65 * 0.8 * P0, 9);
    expect(s.Pnt).toBeCloseTo(60 * 6.32, 9);
    const sp = resolveSection({ ...base, confinement: "spiral" });
    expect(sp.PnMax).toBeCloseTo(0.85 * P0, 9);
    expect(sp.phiPnMax).toBeCloseTo(0.75 * 0.85 * P0, 9);
  });
  it("derives the tie: #3 at min(16 db, 48 dtie, least dimension) rounded down (25.7.2.1)", () => {
    expect(s.tie).toEqual({ size: "#3", db: 0.375, spacing: 16, given: false }); // min(16, 18, 18)
    const t11 = resolveSection({ ...base, layout: { type: "perimeter", size: "#11", nb: 3, nh: 3 } }).tie;
    expect(t11.size).toBe("#4"); // 25.7.2.2
    expect(t11.spacing).toBe(18); // min(22.56, 24, 18)
    const t5 = resolveSection({ ...base, layout: { type: "perimeter", size: "#5", nb: 3, nh: 3 } }).tie;
    expect(t5.spacing).toBe(10); // 16 × 0.625
    const t22 = resolveSection({ ...base, layout: { type: "perimeter", size: "22", nb: 3, nh: 3 } }).tie;
    expect(t22.size).toBe("10");
    expect(t22.spacing).toBe(13); // 16 × 22.2/25.4 = 13.98 → 13
    const tSmall = resolveSection({ ...base, b: 12, h: 12, layout: { type: "perimeter", size: "#9", nb: 2, nh: 2 } }).tie;
    expect(tSmall.spacing).toBe(12); // least dimension governs over 16 × 1.128 = 18.05 and 18
  });
  it("uses the smallest longitudinal bar for 16 db with mixed explicit bars (§7.10)", () => {
    const mixed = resolveSection({
      ...base, layout: undefined,
      bars: [
        { x: -6, y: 8, size: "#11" }, { x: 6, y: 8, size: "#6" },
        { x: 6, y: -8, size: "#11" }, { x: -6, y: -8, size: "#6" },
      ],
    });
    expect(mixed.tie.size).toBe("#4"); // largest bar #11 → #4
    expect(mixed.tie.spacing).toBe(12); // 16 × 0.75 (#6)
  });
  it("keeps a given tie as given", () => {
    const t = resolveSection({ ...base, tie: { size: "#4", spacing: 9.5 } }).tie;
    expect(t).toEqual({ size: "#4", db: 0.5, spacing: 9.5, given: true });
    // the given tie diameter moves the bars inward: edge = 1.5 + 0.5 + 0.5
    const s4 = resolveSection({ ...base, tie: { size: "#4", spacing: 9.5 } });
    expect(s4.bars[0]?.y).toBeCloseTo(11 - 2.5, 12);
  });
});

describe("resolveSection — other layouts", () => {
  it("faces layout: n bars on each face normal to h", () => {
    const s = resolveSection({ ...base, layout: { type: "faces", size: "#9", n: 4 } });
    expect(s.bars).toHaveLength(8);
    const ye = 11 - (1.5 + 0.375 + 1.128 / 2);
    const xe = 9 - (1.5 + 0.375 + 1.128 / 2);
    expect(s.bars.filter((b) => Math.abs(b.y - ye) < 1e-12)).toHaveLength(4);
    expect(s.bars.filter((b) => Math.abs(b.y + ye) < 1e-12)).toHaveLength(4);
    const top = s.bars.filter((b) => b.y > 0).map((b) => b.x);
    expect(top[0]).toBeCloseTo(-xe, 12);
    expect(top[1]).toBeCloseTo(-xe / 3, 12);
    expect(top[3]).toBeCloseTo(xe, 12);
    expect(s.Isey).toBeCloseTo(1.0 * 2 * (2 * xe * xe + 2 * (xe / 3) ** 2), 9);
  });
  it("faces layout with one bar per face puts it on the centreline", () => {
    const s = resolveSection({ ...base, layout: { type: "faces", size: "#9", n: 1 } });
    expect(s.bars.map((b) => b.x)).toEqual([0, 0]);
  });
  it("perimeter 2 × 2 is the four corners", () => {
    const s = resolveSection({ ...base, layout: { type: "perimeter", size: "#8", nb: 2, nh: 2 } });
    expect(s.bars).toHaveLength(4);
  });
  it("perimeter 4 × 5 has 2·4 + 2·3 = 14 bars, evenly spaced", () => {
    const s = resolveSection({ ...base, b: 24, h: 30, layout: { type: "perimeter", size: "#8", nb: 4, nh: 5 } });
    expect(s.bars).toHaveLength(14);
    const right = s.bars.filter((b) => Math.abs(b.x - (12 - 2.375)) < 1e-12).map((b) => b.y).sort((p, q) => p - q);
    expect(right).toHaveLength(5);
    const gaps = right.slice(1).map((y, i) => y - (right[i] as number));
    for (const g of gaps) expect(g).toBeCloseTo((30 - 2 * 2.375) / 4, 12);
  });
  it("circle layout: first bar on +y, equally spaced, radius D/2 − edge", () => {
    const s = resolveSection({
      shape: "circle", D: 24, fc: 4, fy: 60, confinement: "tied", cover: 1.5,
      layout: { type: "circle", size: "#8", n: 6 },
    });
    const R = 12 - 2.375;
    expect(s.b).toBe(24);
    expect(s.h).toBe(24);
    expect(s.D).toBe(24);
    expect(s.bars[0]?.x).toBeCloseTo(0, 12);
    expect(s.bars[0]?.y).toBeCloseTo(R, 12);
    expect(s.bars[1]?.x).toBeCloseTo(R * Math.sin(Math.PI / 3), 12);
    expect(s.bars[1]?.y).toBeCloseTo(R * Math.cos(Math.PI / 3), 12);
    for (const b of s.bars) expect(Math.hypot(b.x, b.y)).toBeCloseTo(R, 12);
    expect(s.Ag).toBeCloseTo(Math.PI * 144, 9);
    expect(s.Igx).toBeCloseTo((Math.PI * 24 ** 4) / 64, 6);
    expect(s.Igy).toBe(s.Igx);
    // Σ A y² over equally spaced bars = n A R² / 2 (closed form, n ≥ 3)
    expect(s.Isex).toBeCloseTo((6 * 0.79 * R * R) / 2, 9);
    expect(s.Isey).toBeCloseTo((6 * 0.79 * R * R) / 2, 9);
  });
  it("spiral pitch: largest meeting ρs,min (25.7.3.3) and 3 in clear, rounded down to 1/4 in", () => {
    const s = resolveSection({
      shape: "circle", D: 20, fc: 5, fy: 60, confinement: "spiral", cover: 1.5,
      layout: { type: "circle", size: "#8", n: 8 },
    });
    // hand: Dch = 17, ρs,min = 0.45 (400/289 − 1)(5/60) = 0.014403; s = 4 (0.11) / (17 ρs) = 1.797 → 1.75
    const rho = 0.45 * (400 / 289 - 1) * (5 / 60);
    expect((4 * 0.11) / (17 * rho)).toBeCloseTo(1.797, 3);
    expect(s.tie.spacing).toBe(1.75);
    expect(s.tie.size).toBe("#3");
    expect(s.PnMax).toBeCloseTo(0.85 * s.P0, 9);
  });
  it("spiral pitch is capped by the 3 in clear pitch for a large column (25.7.3.1)", () => {
    const s = resolveSection({
      shape: "circle", D: 60, fc: 3, fy: 60, confinement: "spiral", cover: 1.5,
      layout: { type: "circle", size: "#8", n: 20 }, tie: undefined,
    });
    // Dch = 57: ρs,min = 0.45 (3600/3249 − 1)(3/60) = 0.002431 → s = 0.44/(57·0.002431) = 3.17 < 3.375
    expect(s.tie.spacing).toBe(3);
    const big = resolveSection({
      shape: "circle", D: 60, fc: 3, fy: 60, confinement: "spiral", cover: 1.5,
      layout: { type: "circle", size: "#11", n: 20 },
    });
    // #4 spiral: s = 0.80/(57·0.002431) = 5.77 → capped at 3 + 0.5 = 3.5
    expect(big.tie.spacing).toBe(3.5);
  });
  it("explicit bars equal the same bars from a layout", () => {
    const fromLayout = resolveSection(base);
    const explicit = resolveSection({
      ...base, layout: undefined, bars: fromLayout.bars.map((b) => ({ x: b.x, y: b.y, size: b.size })),
    });
    expect(explicit).toEqual(fromLayout);
  });
  it("accepts metric bars and a zero cover", () => {
    const s = resolveSection({ ...base, cover: 0, layout: { type: "perimeter", size: "25", nb: 2, nh: 2 } });
    expect(s.Ast).toBeCloseTo((4 * 510) / 645.16, 12);
    expect(s.bars[0]?.y).toBeCloseTo(11 - (9.5 / 25.4 + 25.4 / 50.8), 12);
  });
  it("handles extreme sizes: a 120 in circle with 60 #18 and a 6 in square with one #3", () => {
    const big = resolveSection({
      shape: "circle", D: 120, fc: 12, fy: 80, confinement: "spiral", cover: 3,
      layout: { type: "circle", size: "#18", n: 60 },
    });
    expect(big.Ast).toBeCloseTo(240, 9);
    expect(big.beta1).toBe(0.65);
    const tiny = resolveSection({
      shape: "rect", b: 6, h: 6, fc: 3, fy: 40, confinement: "tied", cover: 0.75, bars: [{ x: 0, y: 0, size: "#3" }],
    });
    expect(tiny.Ast).toBe(0.11);
    expect(tiny.tie.spacing).toBe(6);
  });
});

describe("resolveSection — invalid input throws, naming the field", () => {
  const cases: [string, SectionInput, RegExp][] = [
    ["missing b", { ...base, b: undefined }, /section\.b/],
    ["missing h", { ...base, h: undefined }, /section\.h/],
    ["zero h", { ...base, h: 0 }, /section\.h/],
    ["NaN b", { ...base, b: Number.NaN }, /section\.b/],
    ["negative b", { ...base, b: -18 }, /section\.b/],
    ["infinite h", { ...base, h: Number.POSITIVE_INFINITY }, /section\.h/],
    ["missing D", { ...base, shape: "circle", layout: { type: "circle", size: "#8", n: 8 } }, /section\.D/],
    ["negative D", { ...base, shape: "circle", D: -2, layout: { type: "circle", size: "#8", n: 8 } }, /section\.D/],
    ["fc = 0", { ...base, fc: 0 }, /section\.fc/],
    ["fc NaN", { ...base, fc: Number.NaN }, /section\.fc/],
    ["fy > 80", { ...base, fy: 100 }, /section\.fy.*80/],
    ["fy = 0", { ...base, fy: 0 }, /section\.fy/],
    ["unknown layout size", { ...base, layout: { type: "perimeter", size: "#12" as "#8", nb: 3, nh: 3 } }, /layout\.size/],
    ["unknown explicit size", { ...base, layout: undefined, bars: [{ x: 0, y: 0, size: "#2" as "#8" }] }, /bars\.0\.size/],
    ["no bars", { ...base, layout: undefined, bars: [] }, /at least 1 bar/],
    ["neither bars nor layout", { ...base, layout: undefined }, /bars or a layout/],
    ["both bars and layout", { ...base, bars: [{ x: 0, y: 0, size: "#8" }] }, /either bars or layout/],
    ["bar outside (x)", { ...base, layout: undefined, bars: [{ x: 8.6, y: 0, size: "#8" }] }, /bars\.0.*outside/],
    ["bar outside (y)", { ...base, layout: undefined, bars: [{ x: 0, y: -11, size: "#8" }] }, /bars\.0.*outside/],
    ["bar outside circle", { ...base, shape: "circle", D: 20, layout: undefined, bars: [{ x: 7.2, y: 7.2, size: "#8" }] }, /outside/],
    ["NaN bar x", { ...base, layout: undefined, bars: [{ x: Number.NaN, y: 0, size: "#8" }] }, /bars\.0\.x/],
    ["layout does not fit", { ...base, b: 4, layout: { type: "perimeter", size: "#8", nb: 2, nh: 2 } }, /section\.b.*too small/],
    ["nb = 1", { ...base, layout: { type: "perimeter", size: "#8", nb: 1, nh: 3 } }, /layout\.nb/],
    ["fractional n", { ...base, layout: { type: "faces", size: "#8", n: 2.5 } }, /layout\.n/],
    ["circle layout on a rectangle", { ...base, layout: { type: "circle", size: "#8", n: 8 } }, /circular section/],
    ["perimeter layout on a circle", { ...base, shape: "circle", D: 20 }, /rectangular section/],
    ["negative cover", { ...base, cover: -1 }, /section\.cover/],
    ["bad tie size", { ...base, tie: { size: "#1" as "#3", spacing: 10 } }, /tie\.size/],
    ["zero tie spacing", { ...base, tie: { size: "#3", spacing: 0 } }, /tie\.spacing/],
  ];
  it.each(cases)("%s", (_name, input, message) => {
    expect(() => resolveSection(input)).toThrow(RangeError);
    expect(() => resolveSection(input)).toThrow(message);
  });
  it("throws TypeError for an unknown shape or confinement", () => {
    expect(() => resolveSection({ ...base, shape: "square" as "rect" })).toThrow(TypeError);
    expect(() => resolveSection({ ...base, confinement: "hoops" as "tied" })).toThrow(TypeError);
  });
  it("does not throw for detailing violations (they are data): 1 bar, ρ above 8 %", () => {
    expect(() => resolveSection({ ...base, layout: undefined, bars: [{ x: 0, y: 0, size: "#8" }] })).not.toThrow();
    const heavy = resolveSection({ ...base, b: 12, h: 12, layout: { type: "perimeter", size: "#18", nb: 2, nh: 2 } });
    expect(heavy.rho).toBeGreaterThan(0.08);
  });
});

describe("rotateSection", () => {
  it("turns bars about the centroid and keeps strengths", () => {
    const c = resolveSection({
      shape: "circle", D: 24, fc: 4, fy: 60, confinement: "tied", cover: 1.5,
      layout: { type: "circle", size: "#8", n: 8 },
    });
    const r = rotateSection(c, Math.PI / 8);
    const R = 12 - 2.375;
    expect(r.bars[0]?.x).toBeCloseTo(-R * Math.sin(Math.PI / 8), 12);
    expect(r.bars[0]?.y).toBeCloseTo(R * Math.cos(Math.PI / 8), 12);
    expect(r.P0).toBe(c.P0);
    expect(r.Isex).toBeCloseTo(c.Isex, 9); // equally spaced: rotation invariant
    expect(c.bars[0]?.y).toBeCloseTo(R, 12); // original untouched
    expect(() => rotateSection(c, Number.NaN)).toThrow(RangeError);
  });
});

describe("measureCircularSegment (exact)", () => {
  // textbook closed form with the central angle θ = 2 acos((R − a)/R):
  // A = R² (θ − sin θ)/2, centroid from the centre ȳ = 4 R sin³(θ/2) / (3 (θ − sin θ))
  const textbook = (R: number, a: number): [number, number] => {
    const th = 2 * Math.acos((R - a) / R);
    return [(R * R * (th - Math.sin(th))) / 2, (4 * R * Math.sin(th / 2) ** 3) / (3 * (th - Math.sin(th)))];
  };
  it.each([0.01, 0.5, 2, 5, 9.99, 10, 13, 18, 19.99])("R = 10, a = %s matches the closed-form segment", (a) => {
    const [A, y] = textbook(10, a);
    const out = measureCircularSegment(10, a);
    expect(out[0]).toBeCloseTo(A, 9);
    expect(out[1]).toBeCloseTo(y, 9);
  });
  it("half disc: A = πR²/2, ȳ = 4R/(3π)", () => {
    const out = measureCircularSegment(12, 12);
    expect(out[0]).toBeCloseTo((Math.PI * 144) / 2, 10);
    expect(out[1]).toBeCloseTo(48 / (3 * Math.PI), 10);
  });
  it("agrees with an independent numerical integration (Simpson, 20 000 strips; √ edge limits it to ~1e-5)", () => {
    const R = 9;
    const a = 6.3;
    const n = 20000;
    let A = 0;
    let M = 0;
    const h = a / n;
    for (let i = 0; i <= n; i++) {
      const y = R - a + i * h;
      const w = 2 * Math.sqrt(Math.max(0, R * R - y * y));
      const k = i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2;
      A += (k * w * h) / 3;
      M += (k * w * y * h) / 3;
    }
    const out = measureCircularSegment(R, a);
    expect(Math.abs((out[0] as number) - A) / A).toBeLessThan(1e-5);
    expect(Math.abs((out[1] as number) - M / A) / (M / A)).toBeLessThan(1e-5);
  });
  it("empty and full segments; bad radius throws", () => {
    expect(measureCircularSegment(5, 0)[0]).toBe(0);
    expect(measureCircularSegment(5, -1)[0]).toBe(0);
    const full = measureCircularSegment(5, 10);
    expect(full[0]).toBeCloseTo(25 * Math.PI, 12);
    expect(full[1]).toBe(0);
    expect(() => measureCircularSegment(0, 1)).toThrow(RangeError);
  });
});

describe("clipRectangleBlock and the closed-form inclined block", () => {
  it("axis-aligned block on the +y face", () => {
    expect([...clipRectangleBlock(9, 11, 0, 1, 7)]).toEqual([72, 0, 9]);
    const side = clipRectangleBlock(9, 11, -1, 0, 9 - 3);
    expect(side[0]).toBeCloseTo(66, 12);
    expect(side[1]).toBeCloseTo(-7.5, 12);
    expect(side[2]).toBeCloseTo(0, 12);
  });
  it("corner triangle at 45°: legs a√2, area a², centroid one third along the legs", () => {
    const u = Math.SQRT1_2;
    const t0 = (9 + 11) * u;
    const a = 2;
    const out = clipRectangleBlock(9, 11, u, u, t0 - a);
    const leg = a / u;
    expect(out[0]).toBeCloseTo((leg * leg) / 2, 10);
    expect(out[1]).toBeCloseTo(9 - leg / 3, 10);
    expect(out[2]).toBeCloseTo(11 - leg / 3, 10);
  });
  it("whole and empty rectangles", () => {
    const all = clipRectangleBlock(9, 11, 0.6, -0.8, -100);
    expect(all[0]).toBeCloseTo(396, 10);
    expect(all[1]).toBeCloseTo(0, 10);
    expect(clipRectangleBlock(9, 11, 0.6, -0.8, 100)[0]).toBe(0);
  });
  it("block + complement = rectangle, first moments cancel (any angle)", () => {
    for (let i = 0; i < 50; i++) {
      const ang = (i * 2 * Math.PI) / 50 + 0.013;
      const ux = Math.sin(ang);
      const uy = Math.cos(ang);
      const t = -10 + (i * 20) / 49;
      const p = clipRectangleBlock(9, 11, ux, uy, t);
      const q = clipRectangleBlock(9, 11, -ux, -uy, -t);
      expect((p[0] as number) + (q[0] as number)).toBeCloseTo(396, 9);
      expect((p[0] as number) * (p[1] as number) + (q[0] as number) * (q[1] as number)).toBeCloseTo(0, 8);
      expect((p[0] as number) * (p[2] as number) + (q[0] as number) * (q[2] as number)).toBeCloseTo(0, 8);
    }
  });
  it("the closed-form block used in the hot loop equals polygon clipping", () => {
    const out = new Float64Array(3);
    for (let i = 0; i < 200; i++) {
      const ang = (i * 2 * Math.PI) / 200 + 0.001;
      const ux = Math.sin(ang);
      const uy = Math.cos(ang);
      const tmax = 9 * Math.abs(ux) + 11 * Math.abs(uy);
      for (const f of [0.01, 0.2, 0.45, 0.5, 0.7, 0.99, 1]) {
        const a = f * 2 * tmax;
        rectangleBlockInto(9, 11, ux, uy, a, out);
        const ref = clipRectangleBlock(9, 11, ux, uy, tmax - a);
        expect(out[0]).toBeCloseTo(ref[0] as number, 8);
        expect(out[1]).toBeCloseTo(ref[1] as number, 8);
        expect(out[2]).toBeCloseTo(ref[2] as number, 8);
      }
    }
  });
});
