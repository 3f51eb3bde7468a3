/**
 * Number of tie sets over a length: ⌈L/s⌉ + 1 with s the governing spacing rounded down to
 * a whole inch (column-checks.md §6).
 *
 * @param L length, in
 * @param s tie spacing, in (≥ 1)
 * @example computeTieCount(204, 16) // 14
 */
export function computeTieCount(L: number, s: number): number {
  const sr = Math.max(1, Math.floor(s + 1e-9));
  return Math.ceil(L / sr - 1e-9) + 1;
}
