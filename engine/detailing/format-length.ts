/**
 * Format a length (in) for a detailing message in the display units: "4.75 in" or "120.7 mm".
 * @example formatLength(4.75, "SI") // "120.7 mm"
 */
export function formatLength(inches: number, units: "US" | "SI" = "US"): string {
  return units === "SI" ? `${(inches * 25.4).toFixed(1)} mm` : `${Math.round(inches * 100) / 100} in`;
}
