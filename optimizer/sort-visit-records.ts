/**
 * Stable sort of visit records by their first number (cents), for the candidate table.
 *
 * A record is 4 unsigned 32-bit integers: cents, carbon units, utilization lower bound, and a
 * tag (candidate index × 4 + region). A least-significant-digit radix sort on 11-bit digits moves whole
 * records through memory in streams (2 048 write positions per pass stay in cache). A
 * comparison sort of packed keys followed by gathering each candidate's numbers at random did
 * the same work with cache misses, which two threads sharing a core's caches could not overlap.
 * Stability keeps equal cents in the order the records were written, so the visiting order is
 * (cents, index) exactly as before.
 */

const DIGIT_BITS = 11;
const BUCKETS = 1 << DIGIT_BITS;

/** Largest key the radix passes take. */
export const MAX_RADIX_KEY = 2 ** 32 - 1;

/**
 * Sorts the first n records of `a` (stride 4) by record[0], using `b` (same length) as the
 * other buffer; maxKey bounds the keys (fewer passes for smaller keys).
 *
 * @returns whichever of a and b holds the sorted records
 * @example const sorted = sortVisitRecords(recs, spare, n, maxCents)
 */
export function sortVisitRecords(a: Uint32Array, b: Uint32Array, n: number, maxKey: number): Uint32Array {
  if (!(maxKey >= 0 && maxKey <= MAX_RADIX_KEY)) throw new RangeError(`radix keys must lie in 0…2^32 − 1 (got ${maxKey})`);
  let passes = 1;
  while (passes * DIGIT_BITS < 32 && maxKey >= 2 ** (passes * DIGIT_BITS)) passes++;
  // one read of the keys fills every pass's histogram
  const counts = new Int32Array(BUCKETS * passes);
  for (let i = 0; i < n; i++) {
    const key = a[4 * i] as number;
    for (let p = 0; p < passes; p++) {
      const at = p * BUCKETS + ((key >>> (p * DIGIT_BITS)) & (BUCKETS - 1));
      counts[at] = (counts[at] as number) + 1;
    }
  }
  let src = a;
  let dst = b;
  const next = new Int32Array(BUCKETS);
  for (let p = 0; p < passes; p++) {
    const base = p * BUCKETS;
    let sum = 0;
    for (let d = 0; d < BUCKETS; d++) {
      next[d] = sum;
      sum += counts[base + d] as number;
    }
    const shift = p * DIGIT_BITS;
    for (let i = 0; i < n; i++) {
      const r = 4 * i;
      const key = src[r] as number;
      const digit = (key >>> shift) & (BUCKETS - 1);
      const slot = next[digit] as number;
      next[digit] = slot + 1;
      const at = 4 * slot;
      dst[at] = key;
      dst[at + 1] = src[r + 1] as number;
      dst[at + 2] = src[r + 2] as number;
      dst[at + 3] = src[r + 3] as number;
    }
    const t = src;
    src = dst;
    dst = t;
  }
  return src;
}
