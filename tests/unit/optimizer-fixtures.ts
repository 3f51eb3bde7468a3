/**
 * Requests for the optimizer tests. Every number here is an invented test scenario (no outside
 * source): the tests compare the pruned search with an exhaustive one and with the engine's
 * own member check, so the scenarios only need to exercise different governing conditions.
 */
import type { LoadCase } from "../../engine/types";

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

/** The ten cases on a 23 ft column over a small mixed space (rectangles, tied and spiral circles). */
export const mixedRequest = {
  member: { lu: 276, kx: 1.0, ky: 1.0, braced: true },
  loads: tenCases,
  prices,
  carbon,
  space: {
    b: [14, 26, 4], h: [14, 26, 4], D: [14, 26, 4], fc: [4, 8], sizes: ["#7", "#10"],
    braceLevels: [0, 1, 2], confinement: ["tied", "spiral"],
  },
};

/** Low axial load, large single-curvature moments about x (tension-side behaviour matters). */
export const flexureRequest = {
  member: { lu: 180, kx: 1.0, ky: 1.0, braced: true },
  loads: [
    { name: "1.2D+1.6L", Pu: 120, betaDns: 0.6, Mx: { M1: 1500, M2: 2600, curvature: "single" } },
    { name: "0.9D+1.0W", Pu: 60, betaDns: 1.0, Mx: { M1: 2400, M2: 3000, curvature: "double" }, My: { M1: 200, M2: 500, curvature: "double" } },
  ] satisfies LoadCase[],
  prices,
  carbon,
  space: { shapes: ["rect"], b: [12, 24, 2], h: [16, 28, 4], fc: [4, 5, 6], sizes: ["#8", "#9", "#11"], braceLevels: [0, 1] },
};

/** A sway column with story stability data; only circles with ties or a spiral. */
export const swayRequest = {
  member: { lu: 168, kx: 1.6, ky: 1.6, braced: false, sway: { x: { Q: 0.06 }, y: { sumPu: 5200, sumPc: 60000 } } },
  loads: [
    { name: "1.2D+1.6L", Pu: 520, betaDns: 0.55, Mx: { M1: 250, M2: 500, curvature: "double", M1s: 0, M2s: 0 } },
    { name: "1.2D+1.0W+L", Pu: 400, betaDns: 0.7, Mx: { M1: 200, M2: 420, curvature: "double", M1s: 500, M2s: 700 }, My: { M1: 100, M2: 150, curvature: "double", M1s: 300, M2s: 400 } },
  ] satisfies LoadCase[],
  prices,
  carbon,
  space: { shapes: ["circle"], D: [14, 32, 2], fc: [4, 5, 6, 8], sizes: ["#6", "#7", "#8", "#9"], confinement: ["tied", "spiral"] },
};

/** A slender 40 ft column where architecture caps the width: intermediate bracing wins. */
export const bracingWinsRequest = {
  member: { lu: 480, kx: 1.0, ky: 1.0, braced: true },
  loads: [
    { name: "1.2D+1.6L", Pu: 420, betaDns: 0.6, Mx: { M1: 200, M2: 400, curvature: "single" }, My: { M1: 100, M2: 200, curvature: "single" } },
    { name: "1.2D+1.0W+L", Pu: 330, betaDns: 0.75, Mx: { M1: 500, M2: 900, curvature: "double" } },
  ] satisfies LoadCase[],
  prices: { ...prices, brace: 600 },
  carbon,
  space: { b: [12, 20, 2], h: [12, 20, 2], D: [12, 20, 2], fc: [5, 8], sizes: ["#7", "#9"], braceLevels: [0, 1, 2], maxWidth: 20 },
};

/** A short column with costly braces: bracing loses (same loads). */
export const bracingLosesRequest = {
  ...bracingWinsRequest,
  member: { lu: 144, kx: 1.0, ky: 1.0, braced: true },
  prices: { ...prices, brace: 2400 },
};

/** Loads no section in the space can carry. */
export const infeasibleRequest = {
  member: { lu: 276, kx: 1.0, ky: 1.0, braced: true },
  loads: [
    { name: "1.2D+1.6L", Pu: 2600, betaDns: 0.6, Mx: { M1: 800, M2: 1600, curvature: "single" } },
    { name: "0.9D+1.0W", Pu: 400, betaDns: 1.0, Mx: { M1: 1000, M2: 2000, curvature: "double" } },
  ] satisfies LoadCase[],
  prices,
  carbon,
  space: { b: [12, 20, 4], h: [12, 20, 4], D: [12, 20, 4], fc: [4, 5], sizes: ["#8", "#9"], braceLevels: [0, 1] },
};
