/**
 * Compression lap splice length, in (25.5.5.1): fy ≤ 60 ksi: 0.0005 fy db; fy > 60 ksi:
 * (0.0009 fy − 24) db, fy in psi; at least 12 in; increased by one third when f'c < 3 ksi
 * (25.5.5.1, from memory).
 *
 * @param fy yield strength, ksi
 * @param db bar diameter, in
 * @param fc f'c, ksi
 * @example computeLapLength(60, 1.0, 5) // 30 in
 */
export function computeLapLength(fy: number, db: number, fc: number): number {
  const fyPsi = fy * 1000;
  const base = fy <= 60 ? 0.0005 * fyPsi * db : (0.0009 * fyPsi - 24) * db;
  const l = Math.max(base, 12);
  return fc < 3 ? (l * 4) / 3 : l;
}
