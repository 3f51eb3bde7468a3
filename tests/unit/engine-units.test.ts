import { describe, expect, it } from "vitest";
import {
  checkMember,
  convertCheckInput,
  convertCheckOutput,
  convertForce,
  convertLength,
  convertMoment,
  convertStiffness,
  convertStress,
  KNM_PER_KIPIN,
  MPA_PER_KSI,
  type CheckInput,
} from "@/engine";

describe("unit conversions (exact definitions: 1 in = 25.4 mm, 1 lbf = 4.4482216152605 N)", () => {
  it("factors", () => {
    expect(convertLength(1, "SI")).toBe(25.4);
    expect(convertForce(1, "SI")).toBeCloseTo(4.4482216152605, 13);
    expect(MPA_PER_KSI).toBeCloseTo(6.894757293, 8); // 1 ksi = 6.894757 MPa
    expect(KNM_PER_KIPIN).toBeCloseTo(0.112984829, 8); // 1 kip-in = 0.1129848 kN·m
    expect(convertStiffness(1, "SI")).toBeCloseTo(4.4482216152605 * 0.0254 ** 2, 15);
  });

  it("round trips are the identity", () => {
    for (const v of [0, 1, -3.5, 1234.5678]) {
      expect(convertForce(convertForce(v, "SI"), "US")).toBeCloseTo(v, 10);
      expect(convertLength(convertLength(v, "US"), "SI")).toBeCloseTo(v, 10);
      expect(convertStress(convertStress(v, "SI"), "US")).toBeCloseTo(v, 10);
      expect(convertMoment(convertMoment(v, "SI"), "US")).toBeCloseTo(v, 10);
    }
  });

  it("a check run in SI gives the US result converted (same utilization, converted moments)", () => {
    const us: CheckInput = {
      section: { shape: "rect", b: 18, h: 22, fc: 5, fy: 60, confinement: "tied", cover: 1.5, layout: { type: "perimeter", size: "#8", nb: 3, nh: 4 } },
      member: { lu: 204, kx: 1, ky: 1, braced: true },
      options: { ei: "b", dagg: 0.75 },
      loads: [{ name: "L1", Pu: 310, betaDns: 0.55, Mx: { M1: 700, M2: 1450, curvature: "single" } }],
      prices: { concrete: { "5": 200 }, steel: 1.15, formwork: 13.5, roundFormwork: 18, brace: 2400 },
    };
    const si = convertCheckInput(us, "SI");
    expect(si.section.b).toBeCloseTo(457.2, 10);
    expect(si.loads[0]!.Pu).toBeCloseTo(310 * 4.4482216152605, 9);
    const back = convertCheckInput(si, "US");
    expect(back.section.fc).toBeCloseTo(5, 12);
    expect(back.prices!.concrete["5"]).toBeCloseTo(200, 9);
    const rUS = checkMember(us);
    const rSI = convertCheckOutput(checkMember(back), "SI");
    expect(rSI.utilization!).toBeCloseTo(rUS.utilization!, 9);
    expect(rSI.cases[0]!.x.Mc).toBeCloseTo(rUS.cases[0]!.x.Mc * KNM_PER_KIPIN, 6);
    expect(rSI.cases[0]!.x.EI!).toBeCloseTo(convertStiffness(rUS.cases[0]!.x.EI!, "SI"), 3);
    expect(rSI.section.Ag).toBeCloseTo(396 * 645.16, 6);
    expect(rSI.quantities.concreteYd3).toBeCloseTo(rUS.quantities.concreteYd3 * 0.764554857984, 10); // m³
    expect(rSI.cost!.total).toBeCloseTo(rUS.cost!.total, 9);
    const spacing = rSI.section.detailing.find((d) => d.rule === "clear-spacing")!;
    expect(spacing.unit).toBe("mm");
    expect(spacing.limit).toBeCloseTo(1.5 * 25.4, 9);
    expect(rSI.section.detailing.find((d) => d.rule === "rho-min")!.value).toBeCloseTo(rUS.section.rho, 12);
    expect(rSI.assumptions.units).toBe("SI");
  });
});
