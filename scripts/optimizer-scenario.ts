/**
 * The optimizer's reference scenario: a tall interior column's ten load combinations with the
 * price book and carbon factors of the contract's example. Invented numbers (no outside source),
 * shared by the optimizer benchmark and its tests so both measure the same column.
 */
import type { LoadCase } from "../engine/types";

export const prices = {
  concrete: { "4": 190, "5": 200, "6": 215, "8": 245 },
  steel: 1.15,
  formwork: 13.5,
  roundFormwork: 18.0,
  brace: 2400,
};
export const carbon = { concrete: { "4": 260, "5": 290, "6": 320, "8": 380 }, steel: 0.4 };

/** Ten combinations of a tall interior column: gravity, wind both ways, seismic (invented). */
export const tenCases: LoadCase[] = [
  { name: "1.4D", Pu: 620, betaDns: 1.0, Mx: { M1: 300, M2: 600, curvature: "single" }, My: { M1: 100, M2: 200, curvature: "double" } },
  { name: "1.2D+1.6L", Pu: 780, betaDns: 0.6, Mx: { M1: 500, M2: 1100, curvature: "single" }, My: { M1: 150, M2: 300, curvature: "double" } },
  { name: "1.2D+1.6L+0.5S", Pu: 800, betaDns: 0.58, Mx: { M1: 520, M2: 1150, curvature: "single" }, My: { M1: 160, M2: 320, curvature: "double" } },
  { name: "1.2D+1.6S+L", Pu: 760, betaDns: 0.62, Mx: { M1: 480, M2: 1050, curvature: "single" }, My: { M1: 140, M2: 280, curvature: "double" } },
  { name: "1.2D+1.0W+L", Pu: 560, betaDns: 0.75, Mx: { M1: 900, M2: 1900, curvature: "double" }, My: { M1: 200, M2: 400, curvature: "single" } },
  { name: "1.2D+1.0Wy+L", Pu: 540, betaDns: 0.78, Mx: { M1: 300, M2: 700, curvature: "single" }, My: { M1: 700, M2: 1500, curvature: "double" } },
  { name: "0.9D+1.0W", Pu: 330, betaDns: 1.0, Mx: { M1: 900, M2: 1850, curvature: "double" }, My: { M1: 0, M2: 0, curvature: "double" } },
  { name: "0.9D+1.0Wy", Pu: 320, betaDns: 1.0, Mx: { M1: 0, M2: 0, curvature: "double" }, My: { M1: 700, M2: 1450, curvature: "double" } },
  { name: "1.2D+1.0E+L", Pu: 600, betaDns: 0.7, Mx: { M1: 1000, M2: 2100, curvature: "double" }, My: { M1: 300, M2: 600, curvature: "double" } },
  { name: "0.9D+1.0E", Pu: 300, betaDns: 1.0, Mx: { M1: 1000, M2: 2000, curvature: "double" }, My: { M1: 300, M2: 600, curvature: "single" } },
];
