/**
 * Pareto fronts with the rounding and ordering settled in column-checks.md §7.12:
 * B dominates A when B is no worse on both objectives and better on one, comparing cost
 * rounded to cents and utilization rounded to 1e-4; exact ties are all kept; the front is
 * sorted by cost, then utilization, then id; the best is the cheapest, then the lower
 * utilization, then the id (so the best is always the first front member).
 *
 * Objectives are compared as integers (cents, 1e-4 units, 0.01 kgCO2e) so that equality
 * is exact and no two runs can disagree about a tie.
 */

/** Cost in whole cents (the unit every cost comparison uses). */
export function toCents(cost: number): number {
  return Math.round(cost * 100);
}

/** Utilization in whole 1e-4 units. */
export function toUtilUnits(utilization: number): number {
  return Math.round(utilization * 1e4);
}

/** Carbon in whole 0.01 kgCO2e (our choice: §7.12 settles only cost and utilization). */
export function toCarbonUnits(carbon: number): number {
  return Math.round(carbon * 100);
}

export interface Scored {
  id: string;
  /** first objective, already an integer (lower is better) */
  a: number;
  /** second objective, already an integer (lower is better) */
  b: number;
}

/** Total order used everywhere: a, then b, then id (code-unit order, locale-free). */
export function compareScored(x: Scored, y: Scored): number {
  if (x.a !== y.a) return x.a - y.a;
  if (x.b !== y.b) return x.b - y.b;
  return x.id < y.id ? -1 : x.id > y.id ? 1 : 0;
}

/** True when `p` dominates `q`: no worse on both integer objectives and better on one. */
export function dominates(p: Scored, q: Scored): boolean {
  return p.a <= q.a && p.b <= q.b && (p.a < q.a || p.b < q.b);
}

/**
 * The non-dominated members of `items`, sorted by a, b, id. Exact ties (same a and b)
 * are all kept. O(n log n).
 */
export function selectFront<T extends Scored>(items: readonly T[]): T[] {
  const sorted = [...items].sort(compareScored);
  const front: T[] = [];
  let bestB = Number.POSITIVE_INFINITY;
  let i = 0;
  while (i < sorted.length) {
    const first = sorted[i] as T;
    // Within one value of `a` the group minimum of `b` comes first (sorted by b).
    const groupMin = first.b;
    let j = i;
    while (j < sorted.length && (sorted[j] as T).a === first.a) {
      const item = sorted[j] as T;
      if (groupMin < bestB && item.b === groupMin) front.push(item);
      j++;
    }
    if (groupMin < bestB) bestB = groupMin;
    i = j;
  }
  return front;
}

/**
 * A growing staircase of known points, answering "is a point with cost `a` and a second
 * objective of at least `bLow` certainly dominated?" in O(log n). Only points that really
 * exist (checked, passing candidates) may be added, so a yes is a proof.
 */
export class Staircase {
  /** strictly increasing a, strictly decreasing b */
  private readonly as: number[] = [];
  private readonly bs: number[] = [];

  get size(): number {
    return this.as.length;
  }

  /** Adds a point; a point dominated by (or equal to) one already present changes nothing. */
  add(a: number, b: number): void {
    const as = this.as;
    const bs = this.bs;
    // first index with as[k] > a
    let lo = 0;
    let hi = as.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if ((as[mid] as number) <= a) lo = mid + 1;
      else hi = mid;
    }
    // a point at or before with b ≤ this b already covers it
    if (lo > 0 && (bs[lo - 1] as number) <= b) return;
    // remove following points that this one covers (a' ≥ a and b' ≥ b)
    let end = lo;
    while (end < as.length && (bs[end] as number) >= b) end++;
    // an equal-a point just before with larger b is replaced too
    let start = lo;
    if (start > 0 && (as[start - 1] as number) === a) start--;
    as.splice(start, end - start, a);
    bs.splice(start, end - start, b);
  }

  /** Smallest b among points with a strictly below `a` (Infinity when none). */
  minBBelow(a: number): number {
    const as = this.as;
    let lo = 0;
    let hi = as.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if ((as[mid] as number) < a) lo = mid + 1;
      else hi = mid;
    }
    return lo === 0 ? Number.POSITIVE_INFINITY : (this.bs[lo - 1] as number);
  }

  /** Smallest b among points with a at or below `a` (Infinity when none). */
  minBAtOrBelow(a: number): number {
    const as = this.as;
    let lo = 0;
    let hi = as.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if ((as[mid] as number) <= a) lo = mid + 1;
      else hi = mid;
    }
    return lo === 0 ? Number.POSITIVE_INFINITY : (this.bs[lo - 1] as number);
  }

  /**
   * True when every point with first objective `a` and second objective ≥ `bLow` is
   * dominated by a known point: one strictly cheaper with b ≤ bLow, or one no dearer with
   * b < bLow.
   */
  dominatesAll(a: number, bLow: number): boolean {
    // fast path for a sweep in cost order: usually every known point is cheaper than `a`,
    // and then the last point (the smallest b) decides
    const n = this.as.length;
    if (n === 0) return false;
    const lastA = this.as[n - 1] as number;
    if (lastA < a) return (this.bs[n - 1] as number) <= bLow;
    return this.minBBelow(a) <= bLow || this.minBAtOrBelow(a) < bLow;
  }

  points(): Array<[number, number]> {
    return this.as.map((a, i) => [a, this.bs[i] as number]);
  }
}
