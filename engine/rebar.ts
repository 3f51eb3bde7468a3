/**
 * Reinforcing bar tables. US sizes per ASTM A615 (inch-pound); metric sizes per
 * ASTM A615M (soft-metric designations). Engine units: in², in, lb/ft.
 */
import type { BarSize, MetricBarSize, UsBarSize } from "./types";

/** US bar sizes in increasing order. */
export const US_BAR_SIZES: readonly UsBarSize[] = ["#3", "#4", "#5", "#6", "#7", "#8", "#9", "#10", "#11", "#14", "#18"];

/** Metric (A615M) bar sizes in increasing order. */
export const METRIC_BAR_SIZES: readonly MetricBarSize[] = ["10", "13", "16", "19", "22", "25", "29", "32", "36", "43", "57"];

/** Properties of one bar in engine units. */
export interface BarProperties {
  /** nominal area, in² */
  area: number;
  /** nominal diameter, in */
  db: number;
  /** nominal weight, lb/ft */
  weightPlf: number;
}

/** ASTM A615 nominal dimensions: area in², diameter in, weight lb/ft. */
const US_TABLE: Readonly<Record<UsBarSize, BarProperties>> = {
  "#3": { area: 0.11, db: 0.375, weightPlf: 0.376 },
  "#4": { area: 0.2, db: 0.5, weightPlf: 0.668 },
  "#5": { area: 0.31, db: 0.625, weightPlf: 1.043 },
  "#6": { area: 0.44, db: 0.75, weightPlf: 1.502 },
  "#7": { area: 0.6, db: 0.875, weightPlf: 2.044 },
  "#8": { area: 0.79, db: 1.0, weightPlf: 2.67 },
  "#9": { area: 1.0, db: 1.128, weightPlf: 3.4 },
  "#10": { area: 1.27, db: 1.27, weightPlf: 4.303 },
  "#11": { area: 1.56, db: 1.41, weightPlf: 5.313 },
  "#14": { area: 2.25, db: 1.693, weightPlf: 7.65 },
  "#18": { area: 4.0, db: 2.257, weightPlf: 13.6 },
};

/**
 * ASTM A615M nominal area (mm²) and diameter (mm). Areas as in column-checks.md §4;
 * diameters are the A615M nominal diameters (from memory).
 */
const METRIC_TABLE: Readonly<Record<MetricBarSize, { areaMm2: number; dbMm: number }>> = {
  "10": { areaMm2: 71, dbMm: 9.5 },
  "13": { areaMm2: 129, dbMm: 12.7 },
  "16": { areaMm2: 199, dbMm: 15.9 },
  "19": { areaMm2: 284, dbMm: 19.1 },
  "22": { areaMm2: 387, dbMm: 22.2 },
  "25": { areaMm2: 510, dbMm: 25.4 },
  "29": { areaMm2: 645, dbMm: 28.7 },
  "32": { areaMm2: 819, dbMm: 32.3 },
  "36": { areaMm2: 1006, dbMm: 35.8 },
  "43": { areaMm2: 1452, dbMm: 43.0 },
  "57": { areaMm2: 2581, dbMm: 57.3 },
};

/** Density of steel used for metric bar weights, kg/m³ (common practice). */
export const STEEL_DENSITY_KG_M3 = 7850;
const MM2_PER_IN2 = 645.16;
const MM_PER_IN = 25.4;
/** 1 kg/m in lb/ft: 2.2046226 lb/kg × 0.3048 m/ft. */
const PLF_PER_KG_M = 2.20462262 * 0.3048;

/**
 * Properties of a metric bar in SI: area mm², diameter mm, weight kg/m.
 * The weight is computed as area × 7850 kg/m³ (not the published A615M column).
 *
 * @param size A615M designation ("10" … "57")
 * @example metricBarProperties("25") // { areaMm2: 510, dbMm: 25.4, weightKgM: 4.0035 }
 */
export function metricBarProperties(size: MetricBarSize): { areaMm2: number; dbMm: number; weightKgM: number } {
  const row = METRIC_TABLE[size];
  if (row === undefined) throw new RangeError(`unknown metric bar size ${String(size)}`);
  return { areaMm2: row.areaMm2, dbMm: row.dbMm, weightKgM: (row.areaMm2 * 1e-6) * STEEL_DENSITY_KG_M3 };
}

/**
 * True when `s` is a known bar designation (US "#3"…"#18" or metric "10"…"57").
 *
 * @example isBarSize("#8") // true; isBarSize("#12") // false
 */
export function isBarSize(s: unknown): s is BarSize {
  return typeof s === "string" && (Object.hasOwn(US_TABLE, s) || Object.hasOwn(METRIC_TABLE, s));
}

/** True for metric (A615M) designations. */
export function isMetricBarSize(s: unknown): s is MetricBarSize {
  return typeof s === "string" && Object.hasOwn(METRIC_TABLE, s);
}

/**
 * Nominal area (in²), diameter (in) and weight (lb/ft) of a bar (ASTM A615 / A615M).
 * Metric bars are converted to inch units; their weight is area × 7850 kg/m³.
 *
 * @throws RangeError for an unknown size
 * @example barProperties("#8") // { area: 0.79, db: 1.0, weightPlf: 2.67 }
 */
export function barProperties(size: BarSize): BarProperties {
  if (typeof size === "string" && Object.hasOwn(US_TABLE, size)) {
    const row = US_TABLE[size as UsBarSize];
    return { area: row.area, db: row.db, weightPlf: row.weightPlf };
  }
  if (isMetricBarSize(size)) {
    const m = metricBarProperties(size);
    return { area: m.areaMm2 / MM2_PER_IN2, db: m.dbMm / MM_PER_IN, weightPlf: m.weightKgM * PLF_PER_KG_M };
  }
  throw new RangeError(`unknown bar size ${JSON.stringify(size)} (expected #3…#18 or metric 10…57)`);
}

/**
 * Minimum tie size for a given largest longitudinal bar (25.7.2.2): #3 for bars up
 * to #10, #4 for #11, #14, #18 (and bundles). Metric: 10 up to 32, 13 for 36, 43, 57.
 *
 * @throws RangeError for an unknown size
 * @example tieSizeFor("#11") // "#4"
 */
export function tieSizeFor(largestLongitudinalSize: BarSize): BarSize {
  if (isMetricBarSize(largestLongitudinalSize)) {
    return METRIC_BAR_SIZES.indexOf(largestLongitudinalSize) <= METRIC_BAR_SIZES.indexOf("32") ? "10" : "13";
  }
  if (!isBarSize(largestLongitudinalSize)) {
    throw new RangeError(`unknown bar size ${JSON.stringify(largestLongitudinalSize)}`);
  }
  return US_BAR_SIZES.indexOf(largestLongitudinalSize) <= US_BAR_SIZES.indexOf("#10") ? "#3" : "#4";
}
