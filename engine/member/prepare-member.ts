import { kernelOf } from "../interaction/section-kernel";
import { computeRadiusOfGyration } from "../slenderness/compute-radius-of-gyration";
import { computeSwayMagnifier } from "../slenderness/compute-sway-magnifier";
import type { AxisConstants } from "../slenderness/run-magnifier-chain";
import type { Axis, CheckOptions, EiOption, MemberInput, ResolvedSection, SwayAxisData } from "../types";
import { formatForce } from "./format-value";

/** Sway state of one axis, fixed per member (6.6.4.6). */
export interface SwayAxisState {
  /** k ℓu/r with the sway k over the full height exceeds 22 (6.2.5.1(a)) */
  slender: boolean;
  /** δs when usable (1 when not slender) */
  deltaS: number;
  /** why the sway column cannot be checked (missing data, δs > 1.5 by Q, unstable story), else null */
  error: string | null;
}

/**
 * A section and member prepared for fast load-case evaluation: per-axis slenderness
 * constants, sway magnifiers, symmetry flags. Build once with prepareMember and reuse for
 * every load case (caseUtilization, checkResolved).
 */
export interface PreparedMember {
  section: ResolvedSection;
  member: MemberInput;
  option: EiOption;
  braced: boolean;
  braceLevels: number;
  segments: number;
  x: AxisConstants;
  y: AxisConstants;
  /** null for braced columns */
  swayX: SwayAxisState | null;
  swayY: SwayAxisState | null;
  circle: boolean;
  /** bars symmetric under y → −y / x → −x (senses of Mx / My equal) */
  symAboutX: boolean;
  symAboutY: boolean;
  displayUnits: "US" | "SI";
  /** report the Bresler comparison on biaxial cases */
  bresler: boolean;
}

function positive(v: unknown, name: string): number {
  if (typeof v !== "number" || !Number.isFinite(v) || v <= 0) {
    throw new RangeError(`${name} must be a positive finite number (got ${String(v)})`);
  }
  return v;
}

function transverseOf(member: MemberInput, axis: Axis): boolean {
  const t = member.transverseLoad;
  if (t === undefined) return false;
  if (typeof t === "boolean") return t;
  return t[axis] === true;
}

function axisConstants(
  section: ResolvedSection,
  member: MemberInput,
  axis: Axis,
  option: EiOption,
  radius: "approx" | "gross",
  segments: number,
): AxisConstants {
  const k = positive(axis === "x" ? member.kx : member.ky, axis === "x" ? "member.kx" : "member.ky");
  const luAxis = positive((axis === "x" ? member.lux : member.luy) ?? member.lu, axis === "x" ? "member.lux" : "member.luy");
  const lu = luAxis / segments;
  const r = computeRadiusOfGyration(section, axis, radius);
  const Ig = axis === "x" ? section.Igx : section.Igy;
  const Ise = axis === "x" ? section.Isex : section.Isey;
  // Along the length of a sway column the member is checked as nonsway (6.6.4.6, column-checks.md §3);
  // the nonsway k is taken as 1.0 there (6.6.4.4.3 permits 1.0 for nonsway members).
  const kPc = member.braced ? k : 1;
  const EI0 = option === "a" ? 0.4 * section.Ec * Ig : 0.2 * section.Ec * Ig + section.Es * Ise; // 6.6.4.4.4(a),(b)
  return {
    axis,
    k,
    lu,
    r,
    klur: (k * lu) / r,
    braced: member.braced,
    pcFactor: (Math.PI * Math.PI) / ((kPc * lu) * (kPc * lu)),
    transverse: transverseOf(member, axis),
    option,
    Ec: section.Ec,
    EI0,
    Ig,
    rho: section.rho,
    P0: section.P0,
    h: section.shape === "circle" ? section.D : axis === "x" ? section.h : section.b,
  };
}

function swayState(ax: AxisConstants, data: SwayAxisData | undefined, axis: Axis, units: "US" | "SI"): SwayAxisState {
  // 6.2.5.1(a): sway slenderness may be neglected for k ℓu/r ≤ 22
  if (ax.klur <= 22) return { slender: false, deltaS: 1, error: null };
  if (data === undefined) {
    return {
      slender: true,
      deltaS: NaN,
      error: `sway column slender about ${axis} (k ℓu/r = ${ax.klur.toFixed(1)} > 22) but no story stability data was given (member.sway.${axis}: Q or ΣPu and ΣPc, 6.6.4.6)`,
    };
  }
  const s = computeSwayMagnifier(data);
  if (s.deltaS === null) {
    const reason =
      "sumPu" in data && !(data.sumPu < 0.75 * data.sumPc)
        ? `story unstable: ΣPu = ${formatForce(data.sumPu, units)} ≥ 0.75 ΣPc = ${formatForce(0.75 * data.sumPc, units)} (6.6.4.6.2(b))`
        : (s.reason ?? "sway magnifier not available");
    return { slender: true, deltaS: NaN, error: `about ${axis}: ${reason}` };
  }
  return { slender: true, deltaS: s.deltaS, error: null };
}

/**
 * Prepare a resolved section and a member for load-case evaluation.
 *
 * @param section from resolveSection (in, ksi)
 * @param member member data (in); `braceLevels` > 0 only for braced columns
 * @param options ei (default "b"), radius (default "approx"), displayUnits
 * @throws RangeError for non-positive lengths or k, a non-integer brace count, or brace
 *   levels on a sway column (intermediate braces are checked for braced columns only, §7.8)
 * @example const prep = prepareMember(resolveSection(s), { lu: 204, kx: 1, ky: 1, braced: true }, { ei: "b" })
 */
export function prepareMember(section: ResolvedSection, member: MemberInput, options: CheckOptions = {}): PreparedMember {
  positive(member.lu, "member.lu");
  if (typeof member.braced !== "boolean") throw new TypeError("member.braced must be true or false");
  const braceLevels = member.braceLevels ?? 0;
  if (!Number.isInteger(braceLevels) || braceLevels < 0 || braceLevels > 20) {
    throw new RangeError(`member.braceLevels must be an integer 0…20 (got ${String(braceLevels)})`);
  }
  if (!member.braced && braceLevels > 0) {
    throw new RangeError("member.braceLevels: intermediate brace levels are checked for braced columns only (braced: true)");
  }
  const option = options.ei ?? "b";
  if (option !== "a" && option !== "b" && option !== "c") throw new RangeError(`options.ei must be "a", "b" or "c"`);
  const radius = options.radius ?? "approx";
  const segments = braceLevels + 1;
  const x = axisConstants(section, member, "x", option, radius, segments);
  const y = axisConstants(section, member, "y", option, radius, segments);
  const circle = section.shape === "circle";
  return {
    section,
    member,
    option,
    braced: member.braced,
    braceLevels,
    segments,
    x,
    y,
    swayX: member.braced ? null : swayState(x, member.sway?.x, "x", options.displayUnits ?? "US"),
    swayY: member.braced ? null : swayState(y, member.sway?.y, "y", options.displayUnits ?? "US"),
    circle,
    // the interaction kernel finds the mirror symmetry once per section
    symAboutX: circle || kernelOf(section).symAboutX,
    symAboutY: circle || kernelOf(section).symAboutY,
    displayUnits: options.displayUnits ?? "US",
    bresler: options.bresler === true,
  };
}
