import type { SwayAxisData } from "../types";

/** Result of the sway magnifier: δs, or null with the reason when it cannot be used. */
export interface SwayMagnifier {
  deltaS: number | null;
  method: "Q" | "sumPc";
  reason: string | null;
}

/**
 * Sway moment magnifier δs (6.6.4.6.2):
 * (a) δs = 1/(1 − Q) ≥ 1, permitted only while δs ≤ 1.5; (b) δs = 1/(1 − ΣPu/(0.75 ΣPc)) ≥ 1.
 * The story is unstable when Q ≥ 1 or ΣPu ≥ 0.75 ΣPc.
 *
 * @param data `{ Q }` (stability index, 6.6.4.4.1) or `{ sumPu, sumPc }` (kip)
 * @example computeSwayMagnifier({ Q: 0.09 }) // δs = 1.0989
 */
export function computeSwayMagnifier(data: SwayAxisData): SwayMagnifier {
  if ("Q" in data) {
    if (!(data.Q < 1)) return { deltaS: null, method: "Q", reason: `story unstable: Q = ${data.Q} ≥ 1 (6.6.4.6.2(a))` };
    const d = Math.max(1, 1 / (1 - data.Q));
    if (d > 1.5) {
      return {
        deltaS: null,
        method: "Q",
        reason: `δs = 1/(1 − Q) = ${d.toFixed(3)} > 1.5: the Q method is not permitted; give ΣPu and ΣPc or use a second-order analysis (6.6.4.6.2)`,
      };
    }
    return { deltaS: d, method: "Q", reason: null };
  }
  const a = 1 - data.sumPu / (0.75 * data.sumPc);
  if (!(a > 0)) {
    return { deltaS: null, method: "sumPc", reason: `story unstable: ΣPu = ${data.sumPu} ≥ 0.75 ΣPc = ${0.75 * data.sumPc} (6.6.4.6.2(b))` };
  }
  return { deltaS: Math.max(1, 1 / a), method: "sumPc", reason: null };
}
