import type { CostBreakdown, CostLine, Prices } from "../types";
import type { QuantityDetail } from "./compute-quantities";

/**
 * Look up a value keyed by f'c (keys are numbers as strings, "5" or "4.5"); keys are
 * compared as numbers so "5" and "5.0" both match.
 *
 * @throws RangeError when no key matches fc
 * @example lookupByStrength({ "5": 200 }, 5) // 200
 */
export function lookupByStrength(table: Record<string, number>, fc: number, what: string): number {
  const direct = table[String(fc)];
  if (direct !== undefined) return direct;
  for (const [k, v] of Object.entries(table)) {
    if (Math.abs(Number(k) - fc) <= 1e-5 * Math.max(1, fc)) return v; // SI keys converted to ksi carry 6 digits
  }
  throw new RangeError(`${what} has no entry for f'c = ${fc} ksi (keys: ${Object.keys(table).join(", ")})`);
}

/**
 * Member cost with a traceable line per quantity (column-checks.md §6): concrete yd³ × price
 * for that f'c, steel lb × $/lb (longitudinal, ties, cross-ties), forms ft² × $/ft² (round
 * forms for circles), brace levels × $/level.
 *
 * @param q quantities (computeQuantities)
 * @param fc f'c, ksi (selects the concrete price)
 * @param braceLevels intermediate brace levels
 * @param prices price book
 * @param strengthLabel how f'c is named in the line item (default "<fc> ksi")
 * @example computeCost(q, 5, 0, prices).total
 */
export function computeCost(
  q: QuantityDetail,
  fc: number,
  braceLevels: number,
  prices: Prices,
  strengthLabel = `${fc} ksi`,
): { total: number; breakdown: CostBreakdown; lines: CostLine[] } {
  const lines: CostLine[] = [];
  const add = (category: CostLine["category"], item: string, quantity: number, unit: string, unitPrice: number) => {
    lines.push({ category, item, quantity, unit, unitPrice, amount: quantity * unitPrice });
  };
  add("concrete", `concrete f'c = ${strengthLabel}, in place`, q.concreteYd3, "yd3", lookupByStrength(prices.concrete, fc, "prices.concrete"));
  add("steel", "longitudinal bars incl. compression laps", q.longitudinalLb, "lb", prices.steel);
  add("steel", "ties or spiral", q.tieLb, "lb", prices.steel);
  if (q.crossTieLb > 0) add("steel", "cross-ties", q.crossTieLb, "lb", prices.steel);
  add("formwork", q.round ? "round column forms" : "column forms", q.formFt2, "ft2", q.round ? prices.roundFormwork : prices.formwork);
  if (braceLevels > 0) add("bracing", "intermediate brace levels", braceLevels, "each", prices.brace);
  const breakdown: CostBreakdown = { concrete: 0, steel: 0, formwork: 0, bracing: 0 };
  let total = 0;
  for (const l of lines) {
    breakdown[l.category] += l.amount;
    total += l.amount;
  }
  return { total, breakdown, lines };
}
