import { checkResolved } from "./member/check-resolved";
import { resolveSection } from "./section";
import type { CheckInput, CheckOutput } from "./types";

/**
 * Check a column member to ACI 318-19 (column-checks.md): resolve the section, then for
 * every load case and both axes the slenderness check (6.2.5.1), the nonsway moment
 * magnifier (6.6.4.5) with M2,min one axis at a time (§7.1), sway magnification (6.6.4.6)
 * when `braced` is false, segments between brace levels (§7.8), uniaxial or biaxial
 * strength at the case's Pu (§7.4, §7.5), the 1.4 cap (6.2.5.3); detailing (§4),
 * quantities, and cost / carbon when prices / carbon factors are given. Engine units:
 * kip, in, ksi, kip-in (convert SI input with convertCheckInput first).
 *
 * @param input the contract's check request (US units)
 * @returns the contract's check output plus `reasons` and `assumptions`
 * @throws RangeError / TypeError for invalid input (e.g. bars outside the section); a
 *   failing design is a result with `pass: false` and reasons
 * @example checkMember({ section, member: { lu: 204, kx: 1, ky: 1, braced: true }, loads }).pass
 */
export function checkMember(input: CheckInput): CheckOutput {
  const section = resolveSection(input.section);
  const extras: { prices?: CheckInput["prices"]; carbon?: CheckInput["carbon"] } = {};
  if (input.prices !== undefined) extras.prices = input.prices;
  if (input.carbon !== undefined) extras.carbon = input.carbon;
  return checkResolved(section, input.member, input.loads, input.options ?? {}, extras);
}
