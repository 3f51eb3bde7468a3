import type { CarbonFactors } from "../types";
import { lookupByStrength } from "./compute-cost";
import type { QuantityDetail } from "./compute-quantities";

/**
 * Embodied carbon, kgCO2e (column-checks.md §6): concrete yd³ × factor for that f'c plus
 * steel lb × factor. Factors are the user's (defaults are typical industry averages).
 *
 * @example computeCarbon(q, 5, { concrete: { "5": 290 }, steel: 0.4 }).total
 */
export function computeCarbon(
  q: Pick<QuantityDetail, "concreteYd3" | "steelLb">,
  fc: number,
  factors: CarbonFactors,
): { total: number; concrete: number; steel: number } {
  const concrete = q.concreteYd3 * lookupByStrength(factors.concrete, fc, "carbon.concrete");
  const steel = q.steelLb * factors.steel;
  return { total: concrete + steel, concrete, steel };
}
