import type { AxisResult } from "../types";

/**
 * The ACI 318-19 clause behind each step of the magnifier chain, for showing beside the
 * values of an AxisResult (product.md: "the magnifier chain ... with the clause beside each step").
 *
 * @example MAGNIFIER_CLAUSES.Pc // "6.6.4.4.2"
 */
export const MAGNIFIER_CLAUSES: Readonly<Record<keyof AxisResult, string>> = {
  klur: "6.2.5.1",
  limit: "6.2.5.1",
  slender: "6.2.5.1",
  EI: "6.6.4.4.4",
  Pc: "6.6.4.4.2",
  Cm: "6.6.4.5.3",
  delta: "6.6.4.5.2",
  M2: "6.6.4.5.4",
  Mc: "6.6.4.5.1",
  phiMn: "22.4, Table 21.2.2",
  ratio: "column-checks.md §5",
  deltaS: "6.6.4.6.2",
};
