/**
 * The invented demo building (our own scenario, every number made up): "Tidewater Commons", a
 * five-storey mixed-use block over a double-height lobby, with a mezzanine, a stair tower, a
 * transfer level and a parking ramp. Several marks pass as short columns but fail once the moment
 * magnifier is included. Units: in, kip, kip-in, ksi.
 */
import type { LoadCase } from "../engine/types";
import type { MarkCreate } from "../lib/validation/mark";

export const DEMO_PROJECT = {
  name: "Tidewater Commons",
  codeBasis: "ACI 318-19" as const,
  units: "US" as const,
  exposure: "interior" as const,
  cover: 1.5,
  eiOption: "b" as const,
  dagg: 0.75,
  notes: "Invented demo building: five storeys of flats over a double-height lobby and retail; mezzanine on grid B; stair tower on grid D; transfer girders at L2 on grid E; parking ramp on grid G.",
};

/** Invented unit prices and carbon factors for the demo (not market data). */
export const DEMO_PRICE_BOOK = {
  prices: { concrete: { "4": 182, "5": 196, "6": 214, "8": 251 }, steel: 1.08, formwork: 12.75, roundFormwork: 17.5, brace: 2150 },
  carbon: { concrete: { "4": 255, "5": 285, "6": 318, "8": 377 }, steel: 0.42 },
  formSet: 900,
};

const rect = (b: number, h: number, fc: number, size: string, nb: number, nh: number) => ({
  shape: "rect" as const,
  b,
  h,
  fc,
  fy: 60,
  confinement: "tied" as const,
  cover: 1.5,
  layout: { type: "perimeter" as const, size: size as "#8", nb, nh },
});

const lc = (name: string, Pu: number, betaDns: number, mx: [number, number, "single" | "double"], my?: [number, number, "single" | "double"]): LoadCase => ({
  name,
  Pu,
  betaDns,
  Mx: { M1: mx[0], M2: mx[1], curvature: mx[2] },
  ...(my ? { My: { M1: my[0], M2: my[1], curvature: my[2] } } : {}),
});

export interface DemoMark {
  mark: MarkCreate;
  loads: LoadCase[];
  /** what the demo is meant to show (kept beside the data so a change that breaks it is noticed) */
  intent: "passes" | "fails-with-slenderness" | "fails";
}

export const DEMO_MARKS: DemoMark[] = [
  {
    intent: "passes",
    mark: { label: "A-1", level: "L1", quantity: 6, member: { lu: 150, kx: 1, ky: 1, braced: true, transverseLoad: false }, limits: {}, design: { section: rect(20, 20, 5, "#8", 3, 3), braceLevels: 0 } },
    loads: [lc("1.4D", 610, 1, [180, 360, "double"]), lc("1.2D+1.6L", 720, 0.55, [240, 520, "double"], [60, 140, "double"]), lc("1.2D+1.0W+1.0L", 560, 0.45, [500, 980, "double"], [80, 190, "double"])],
  },
  {
    intent: "fails-with-slenderness",
    mark: {
      label: "A-2",
      level: "Lobby",
      quantity: 4,
      member: { lu: 312, kx: 1, ky: 1, braced: true, transverseLoad: false },
      limits: { maxB: 18, maxH: 18, note: "max 18 in — architect's lobby line" },
      design: { section: rect(18, 18, 5, "#9", 3, 3), braceLevels: 0 },
    },
    loads: [lc("1.4D", 420, 1, [300, 620, "single"]), lc("1.2D+1.6L", 505, 0.6, [420, 860, "single"], [0, 120, "double"]), lc("0.9D+1.0W", 260, 0.7, [380, 900, "double"])],
  },
  {
    intent: "fails-with-slenderness",
    mark: { label: "B-3", level: "Mezzanine", quantity: 3, member: { lu: 216, kx: 1, ky: 1, braced: true, transverseLoad: false }, limits: {}, design: { section: rect(20, 16, 5, "#8", 3, 3), braceLevels: 0 } },
    loads: [lc("1.4D", 250, 1, [500, 900, "single"]), lc("1.2D+1.6L", 420, 0.55, [700, 2000, "single"], [40, 90, "single"])],
  },
  {
    intent: "passes",
    mark: { label: "C-4", level: "L2–L3", quantity: 12, member: { lu: 114, kx: 1, ky: 1, braced: true, transverseLoad: false }, limits: {}, design: { section: rect(18, 18, 5, "#8", 3, 3), braceLevels: 0 } },
    loads: [lc("1.4D", 380, 1, [160, 300, "double"]), lc("1.2D+1.6L", 470, 0.55, [220, 410, "double"], [50, 110, "double"])],
  },
  {
    intent: "fails-with-slenderness",
    mark: {
      label: "D-1",
      level: "Stair tower",
      quantity: 2,
      member: { lu: 204, kx: 1, ky: 1, braced: true, psi: { x: { top: 1.6, bottom: 2.2 } }, transverseLoad: false },
      limits: { maxB: 14, note: "14 in wall thickness — stair core" },
      design: { section: rect(14, 20, 5, "#8", 2, 4), braceLevels: 0 },
    },
    loads: [lc("1.4D", 300, 1, [150, 340, "single"]), lc("1.2D+1.6L", 360, 0.55, [200, 420, "single"], [30, 130, "single"])],
  },
  {
    intent: "passes",
    mark: { label: "E-2", level: "Transfer L1–L2", quantity: 2, member: { lu: 168, kx: 1, ky: 1, braced: true, transverseLoad: false }, limits: {}, design: { section: rect(24, 24, 6, "#10", 4, 4), braceLevels: 0 } },
    loads: [lc("1.4D", 1250, 1, [400, 900, "double"]), lc("1.2D+1.6L", 1420, 0.5, [600, 1300, "double"], [200, 450, "double"])],
  },
  {
    intent: "fails-with-slenderness",
    mark: {
      label: "F-5",
      level: "Canopy",
      quantity: 5,
      member: { lu: 240, kx: 1, ky: 1, braced: true, transverseLoad: false },
      limits: { maxD: 18, note: "round, 18 in max — storefront" },
      design: { section: { shape: "circle", D: 18, fc: 5, fy: 60, confinement: "tied", cover: 1.5, layout: { type: "circle", size: "#8", n: 8 } }, braceLevels: 0 },
    },
    loads: [lc("1.4D", 300, 1, [250, 520, "single"]), lc("1.2D+1.6L", 360, 0.55, [300, 640, "single"], [60, 160, "single"])],
  },
  {
    intent: "passes",
    mark: {
      label: "G-2",
      level: "Ramp",
      quantity: 4,
      member: { lu: 132, kx: 1.2, ky: 1.2, braced: false, sway: { x: { Q: 0.08 }, y: { Q: 0.06 } }, transverseLoad: false },
      limits: {},
      design: { section: rect(20, 20, 5, "#9", 3, 3), braceLevels: 0 },
    },
    loads: [
      { name: "1.2D+1.6L", Pu: 540, betaDns: 0.55, Mx: { M1: 200, M2: 420, curvature: "double", M1s: 0, M2s: 0 } },
      { name: "1.2D+1.0W+1.0L", Pu: 430, betaDns: 0.45, Mx: { M1: 180, M2: 300, curvature: "double", M1s: 450, M2s: 620 }, My: { M1: 40, M2: 90, curvature: "double" } },
    ],
  },
  {
    intent: "passes",
    mark: {
      label: "H-1",
      level: "Lobby",
      quantity: 2,
      member: { lu: 312, kx: 1, ky: 1, braced: true, transverseLoad: false },
      limits: { note: "braced at the mezzanine line" },
      design: { section: rect(18, 18, 5, "#9", 3, 3), braceLevels: 1 },
    },
    loads: [lc("1.4D", 420, 1, [300, 620, "single"]), lc("1.2D+1.6L", 505, 0.6, [420, 860, "single"], [0, 120, "double"])],
  },
];
