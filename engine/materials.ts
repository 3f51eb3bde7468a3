/**
 * Material constants and relations (ACI 318-19), US customary units: ksi.
 * One small module because every strength calculation needs all of them.
 */

/** Modulus of elasticity of nonprestressed reinforcement, ksi (20.2.2.2). */
export const ES = 29000;

/** Maximum usable strain at the extreme concrete compression fibre (22.2.2.1). */
export const EPS_CU = 0.003;

/** Largest specified yield strength for longitudinal bars in columns, ksi (Table 20.2.2.4(a)). */
export const FY_MAX_LONGITUDINAL = 80;

function assertPositive(value: number, name: string): void {
  if (typeof value !== "number" || !Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${name} must be a positive finite number (got ${String(value)})`);
  }
}

/**
 * Modulus of elasticity of normalweight concrete, ksi.
 *
 * Ec = 57 000 √f'c with f'c in psi (19.2.2.1(b)), i.e. `57·√(1000·fc)` with fc in ksi.
 *
 * @param fc specified compressive strength f'c, ksi (> 0)
 * @returns Ec, ksi
 * @throws RangeError when fc is not a positive finite number
 * @example concreteModulus(5) // ≈ 4030.5 ksi
 */
export function concreteModulus(fc: number): number {
  assertPositive(fc, "fc");
  return 57 * Math.sqrt(1000 * fc);
}

/**
 * Factor β1 relating the depth of the equivalent rectangular stress block to the
 * neutral-axis depth (Table 22.2.2.4.3): 0.85 for f'c ≤ 4 ksi,
 * 0.85 − 0.05 (f'c − 4) for 4 < f'c < 8 ksi, 0.65 for f'c ≥ 8 ksi.
 *
 * @param fc f'c, ksi (> 0)
 * @returns β1 (dimensionless)
 * @throws RangeError when fc is not a positive finite number
 * @example beta1(6) // 0.75
 */
export function beta1(fc: number): number {
  assertPositive(fc, "fc");
  if (fc <= 4) return 0.85;
  if (fc >= 8) return 0.65;
  return 0.85 - 0.05 * (fc - 4);
}

/**
 * Yield strain of longitudinal reinforcement, εty = fy / Es (21.2.2.1, 20.2.2.2).
 *
 * @param fy specified yield strength, ksi (0 < fy ≤ 80, Table 20.2.2.4(a))
 * @returns εty (dimensionless)
 * @throws RangeError when fy is not positive and finite or exceeds 80 ksi
 * @example yieldStrain(60) // ≈ 0.002069
 */
export function yieldStrain(fy: number): number {
  assertLongitudinalFy(fy);
  return fy / ES;
}

/**
 * Check that a longitudinal-bar yield strength is usable: positive, finite and
 * ≤ 80 ksi (Table 20.2.2.4(a)).
 *
 * @param fy ksi
 * @param name field name used in the error message
 * @throws RangeError otherwise
 * @example assertLongitudinalFy(60) // ok; assertLongitudinalFy(100) throws
 */
export function assertLongitudinalFy(fy: number, name = "fy"): void {
  assertPositive(fy, name);
  if (fy > FY_MAX_LONGITUDINAL) {
    throw new RangeError(
      `${name} = ${fy} ksi exceeds ${FY_MAX_LONGITUDINAL} ksi, the limit for longitudinal bars (Table 20.2.2.4(a))`,
    );
  }
}
