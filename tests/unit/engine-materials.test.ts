import { describe, expect, it } from "vitest";
import { EPS_CU, ES, assertLongitudinalFy, beta1, concreteModulus, yieldStrain } from "@/engine/materials";
import {
  METRIC_BAR_SIZES, US_BAR_SIZES, barProperties, isBarSize, isMetricBarSize, metricBarProperties, tieSizeFor,
} from "@/engine/rebar";

describe("materials constants", () => {
  it("uses Es = 29 000 ksi and εcu = 0.003", () => {
    expect(ES).toBe(29000); // 20.2.2.2
    expect(EPS_CU).toBe(0.003); // 22.2.2.1
  });
});

describe("concreteModulus", () => {
  it("is 57 000 √f'c psi expressed in ksi", () => {
    // 19.2.2.1(b): Ec = 57 000 √5000 psi = 4 030 509 psi ≈ 4031 ksi
    expect(concreteModulus(5)).toBeCloseTo(4030.5, 1);
    expect(Math.round(concreteModulus(5))).toBe(4031);
    // closed form in the test: 57·√4000 = 3604.996...
    expect(concreteModulus(4)).toBeCloseTo(57 * Math.sqrt(4000), 9);
  });
  it("grows with √f'c (mid-range and extreme inputs)", () => {
    expect(concreteModulus(16) / concreteModulus(4)).toBeCloseTo(2, 12);
    expect(concreteModulus(1e-6)).toBeGreaterThan(0);
  });
  it.each([0, -1, Number.NaN, Number.POSITIVE_INFINITY])("throws RangeError for f'c = %s", (fc) => {
    expect(() => concreteModulus(fc)).toThrow(RangeError);
  });
});

describe("beta1", () => {
  // Table 22.2.2.4.3 points
  it.each([
    [2.5, 0.85],
    [3, 0.85],
    [4, 0.85],
    [5, 0.8],
    [6, 0.75],
    [7, 0.7],
    [8, 0.65],
    [10, 0.65],
    [20, 0.65],
  ])("f'c = %s ksi → β1 = %s", (fc, b1) => {
    expect(beta1(fc)).toBeCloseTo(b1, 12);
  });
  it("is linear between 4 and 8 ksi (midpoint 4.5 ksi → 0.825)", () => {
    expect(beta1(4.5)).toBeCloseTo(0.825, 12); // 0.85 − 0.05 × 0.5
  });
  it.each([0, -3, Number.NaN])("throws RangeError for f'c = %s", (fc) => {
    expect(() => beta1(fc)).toThrow(RangeError);
  });
});

describe("yieldStrain", () => {
  it("is fy / Es", () => {
    expect(yieldStrain(60)).toBeCloseTo(60 / 29000, 15);
    expect(yieldStrain(80)).toBeCloseTo(80 / 29000, 15);
    expect(yieldStrain(40)).toBeCloseTo(0.0013793, 7);
  });
  it("rejects fy above 80 ksi for longitudinal bars (Table 20.2.2.4(a)) and non-positive fy", () => {
    expect(() => yieldStrain(80.01)).toThrow(RangeError);
    expect(() => yieldStrain(100)).toThrow(/80 ksi/);
    expect(() => yieldStrain(0)).toThrow(RangeError);
    expect(() => yieldStrain(Number.NaN)).toThrow(RangeError);
    expect(() => assertLongitudinalFy(-60, "section.fy")).toThrow(/section\.fy/);
  });
});

describe("rebar tables", () => {
  // ASTM A615 nominal dimensions as listed in column-checks.md §4
  const A615: [string, number, number, number][] = [
    ["#3", 0.11, 0.375, 0.376],
    ["#4", 0.2, 0.5, 0.668],
    ["#5", 0.31, 0.625, 1.043],
    ["#6", 0.44, 0.75, 1.502],
    ["#7", 0.6, 0.875, 2.044],
    ["#8", 0.79, 1.0, 2.67],
    ["#9", 1.0, 1.128, 3.4],
    ["#10", 1.27, 1.27, 4.303],
    ["#11", 1.56, 1.41, 5.313],
    ["#14", 2.25, 1.693, 7.65],
    ["#18", 4.0, 2.257, 13.6],
  ];
  it.each(A615)("%s: area %s in², db %s in, %s lb/ft (ASTM A615)", (size, area, db, w) => {
    expect(isBarSize(size)).toBe(true);
    const p = barProperties(size as "#8");
    expect(p.area).toBe(area);
    expect(p.db).toBe(db);
    expect(p.weightPlf).toBe(w);
  });
  it("US weights match a round bar of the nominal diameter at 490 lb/ft³ (common practice) within 0.2 %", () => {
    for (const [size, , db] of A615) {
      const w = barProperties(size as "#8").weightPlf;
      expect(Math.abs(w - ((Math.PI * db * db) / 4 / 144) * 490) / w).toBeLessThan(0.002);
    }
  });
  it("lists US sizes in increasing order", () => {
    expect(US_BAR_SIZES).toEqual(A615.map((r) => r[0]));
    for (let i = 1; i < US_BAR_SIZES.length; i++) {
      expect(barProperties(US_BAR_SIZES[i] as "#8").area).toBeGreaterThan(barProperties(US_BAR_SIZES[i - 1] as "#8").area);
    }
  });
  // ASTM A615M areas as listed in column-checks.md §4
  const A615M: [string, number][] = [
    ["10", 71], ["13", 129], ["16", 199], ["19", 284], ["22", 387], ["25", 510],
    ["29", 645], ["32", 819], ["36", 1006], ["43", 1452], ["57", 2581],
  ];
  it.each(A615M)("metric %s: %s mm² (ASTM A615M), converted to in²", (size, mm2) => {
    expect(isMetricBarSize(size)).toBe(true);
    const m = metricBarProperties(size as "25");
    expect(m.areaMm2).toBe(mm2);
    // weight computed from area × 7850 kg/m³ (documented choice)
    expect(m.weightKgM).toBeCloseTo(mm2 * 1e-6 * 7850, 12);
    const p = barProperties(size as "25");
    expect(p.area).toBeCloseTo(mm2 / 645.16, 12);
    expect(p.db).toBeCloseTo(m.dbMm / 25.4, 12);
    expect(p.weightPlf).toBeCloseTo(m.weightKgM * 0.67196897, 6);
  });
  it("metric 25 is close to US #8 (soft conversion)", () => {
    expect(barProperties("25").area).toBeCloseTo(0.79, 2);
    expect(barProperties("25").db).toBeCloseTo(1.0, 2);
    expect(METRIC_BAR_SIZES.length).toBe(US_BAR_SIZES.length);
  });
  it("rejects unknown sizes", () => {
    expect(isBarSize("#12")).toBe(false);
    expect(isBarSize("")).toBe(false);
    expect(isBarSize(8)).toBe(false);
    expect(isBarSize("constructor")).toBe(false);
    expect(() => barProperties("#12" as "#8")).toThrow(RangeError);
    expect(() => tieSizeFor("#2" as "#8")).toThrow(RangeError);
  });
});

describe("tieSizeFor (25.7.2.2)", () => {
  it.each([
    ["#3", "#3"], ["#5", "#3"], ["#8", "#3"], ["#10", "#3"],
    ["#11", "#4"], ["#14", "#4"], ["#18", "#4"],
    ["10", "10"], ["25", "10"], ["32", "10"], ["36", "13"], ["43", "13"], ["57", "13"],
  ])("longitudinal %s → tie %s", (bar, tie) => {
    expect(tieSizeFor(bar as "#8")).toBe(tie);
  });
});
