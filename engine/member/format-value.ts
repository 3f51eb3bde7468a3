import { convertForce, convertMoment } from "../units";

/**
 * Format a force (kip) for a reason text in the display units: "412 kip" or "1833 kN".
 * @example formatForce(412.3, "US") // "412 kip"
 */
export function formatForce(kip: number, units: "US" | "SI"): string {
  return units === "SI" ? `${round3(convertForce(kip, "SI"))} kN` : `${round3(kip)} kip`;
}

/**
 * Format a moment (kip-in) for a reason text: "1450 kip-in" or "163.8 kN·m".
 * @example formatMoment(1450, "SI") // "163.8 kN·m"
 */
export function formatMoment(kipIn: number, units: "US" | "SI"): string {
  return units === "SI" ? `${round3(convertMoment(kipIn, "SI"))} kN·m` : `${round3(kipIn)} kip-in`;
}

/** Round for reason texts: integers above 1000, one decimal above 100, two above 1. @example round3(412.34) // "412.3" */
export function round3(v: number): string {
  const a = Math.abs(v);
  if (a >= 1000) return v.toFixed(0);
  if (a >= 100) return v.toFixed(1);
  if (a >= 1) return v.toFixed(2);
  return v.toPrecision(3);
}
