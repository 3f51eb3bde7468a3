/**
 * Joint stiffness ratio ψ = Σ(EI/ℓc) of the columns ÷ Σ(EI/ℓ) of the beams framing
 * into a joint, with the cracked-section moments of inertia 0.70 Ig for columns and
 * 0.35 Ig for beams (Table 6.6.3.1.1(a), commentary R6.2.5).
 */

/** One member framing into the joint: Ec in ksi, gross Ig in in⁴, length (centre to centre) in in. */
export interface FramingMember {
  Ec: number;
  Ig: number;
  length: number;
}

/** ψ taken for a pinned end (common practice). */
export const PSI_PINNED = 10;
/** ψ taken for a fixed end (common practice). */
export const PSI_FIXED = 1;

function sumStiffness(members: readonly FramingMember[], factor: number, what: string): number {
  let s = 0;
  for (const m of members) {
    if (!(m.Ec > 0) || !(m.Ig > 0) || !(m.length > 0) || !Number.isFinite(m.Ec * m.Ig / m.length)) {
      throw new RangeError(`${what}: Ec, Ig and length must be positive finite numbers`);
    }
    s += (factor * m.Ec * m.Ig) / m.length;
  }
  return s;
}

/**
 * Compute ψ at one joint.
 *
 * @param columns the columns meeting at the joint (usually the column checked and the one above/below)
 * @param beams the beams in the plane of bending framing into the joint
 * @returns ψ (dimensionless); Infinity when no beam restrains the joint
 * @throws RangeError when no column is given or a property is not positive
 * @example computePsi([{ Ec: 4031, Ig: 13000, length: 144 }], [{ Ec: 4031, Ig: 26000, length: 288 }]) // 2.0
 */
export function computePsi(columns: readonly FramingMember[], beams: readonly FramingMember[]): number {
  if (columns.length === 0) throw new RangeError("computePsi needs at least one column");
  const c = sumStiffness(columns, 0.7, "column");
  const b = sumStiffness(beams, 0.35, "beam");
  return b === 0 ? Infinity : c / b;
}
