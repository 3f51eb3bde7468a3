/**
 * Display units: values are stored and sent in the engine's US units (in, kip, kip-in, ksi) and
 * converted here, at the edge, when a project works in SI (mm, kN, kN·m, MPa).
 */
import { MM_PER_IN, convertForce, convertLength, convertMoment, convertStiffness, convertStress } from "@/engine/units";

export type UnitSystem = "US" | "SI";
export type Quantity = "length" | "area" | "force" | "moment" | "stress" | "stiffness" | "none";

export const UNIT_LABELS: Record<UnitSystem, Record<Quantity, string>> = {
  US: { length: "in", area: "in²", force: "kip", moment: "kip-in", stress: "ksi", stiffness: "kip-in²", none: "" },
  SI: { length: "mm", area: "mm²", force: "kN", moment: "kN·m", stress: "MPa", stiffness: "kN·m²", none: "" },
};

const CONVERTERS: Record<Exclude<Quantity, "none">, (v: number, to: UnitSystem) => number> = {
  length: convertLength,
  area: (v, to) => (to === "SI" ? v * MM_PER_IN * MM_PER_IN : v / (MM_PER_IN * MM_PER_IN)),
  force: convertForce,
  moment: convertMoment,
  stress: convertStress,
  stiffness: convertStiffness,
};

export function unitLabel(q: Quantity, units: UnitSystem): string {
  return UNIT_LABELS[units][q];
}

/** A stored (US) value in the display system. */
export function toDisplay(value: number, q: Quantity, units: UnitSystem): number {
  if (units === "US" || q === "none") return value;
  return CONVERTERS[q](value, "SI");
}

/** A value typed in the display system, back to US for storage. */
export function fromDisplay(value: number, q: Quantity, units: UnitSystem): number {
  if (units === "US" || q === "none") return value;
  return CONVERTERS[q](value, "US");
}

/** Significant-figure rounding that reads well in tables: 3 decimals below 10, fewer above. */
export function formatNumber(value: number | null | undefined, digits?: number): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  const abs = Math.abs(value);
  const d = digits ?? (abs >= 1000 ? 0 : abs >= 100 ? 1 : abs >= 10 ? 2 : 3);
  return value.toLocaleString("en-US", { minimumFractionDigits: 0, maximumFractionDigits: d });
}

/** "1,234 kip-in" — a number with its unit, always. */
export function formatQuantity(value: number | null | undefined, q: Quantity, units: UnitSystem, digits?: number): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  const shown = formatNumber(toDisplay(value, q, units), digits);
  const label = unitLabel(q, units);
  return label ? `${shown} ${label}` : shown;
}

/** A number typed into an input, rounded for the field (so 25.4 mm does not show as 25.400000001). */
export function inputValue(value: number | undefined, q: Quantity, units: UnitSystem): string {
  if (value === undefined || !Number.isFinite(value)) return "";
  const shown = toDisplay(value, q, units);
  return String(Number(shown.toPrecision(6)));
}
