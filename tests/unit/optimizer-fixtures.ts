/**
 * Requests for the optimizer tests. Every number here is an invented test scenario (no outside
 * source): the tests compare the pruned search with an exhaustive one and with the engine's
 * own member check, so the scenarios only need to exercise different governing conditions.
 */

import type { LoadCase } from "../../engine/types";
import { carbon, prices, tenCases } from "../../scripts/optimizer-scenario";

export { carbon, prices, tenCases };

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
