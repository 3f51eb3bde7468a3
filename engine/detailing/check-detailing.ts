import { barProperties } from "../rebar";
import type { CheckOptions, DetailingResult, ResolvedSection } from "../types";
import { checkBarCount } from "./check-bar-count";
import { checkClearSpacing } from "./check-clear-spacing";
import { checkCover } from "./check-cover";
import { checkSpiral } from "./check-spiral";
import { checkSteelRatio } from "./check-steel-ratio";
import { checkTies } from "./check-ties";
import { checkLateralSupport, countCrossTies, type CrossTieCount } from "./count-cross-ties";

/**
 * Every detailing rule of column-checks.md §4 as data: rho-min, rho-max (10.6.1.1), bar-count
 * (10.7.3.1), clear-spacing (25.2.3), cover (Table 20.5.1.3.1), tie-size (25.7.2.2) and
 * tie-spacing (25.7.2.1) for tied sections, lateral-support (25.7.2.3), and for spirals
 * spiral-ratio (25.7.3.3), spiral-pitch-max/-min (25.7.3.1), spiral-size (25.7.3.2).
 * Lengths in `value`/`limit` are in inches (`unit: "in"`); messages quote lengths in
 * `options.displayUnits`.
 *
 * @param section resolved section
 * @param options dagg (default 0.75 in), rhoMax, exposure (default interior)
 * @returns the rules and the cross-tie count (also used by the quantities); the rule objects
 *   are shared between calls for the same section: treat them as read-only
 * @example checkDetailing(sec, { dagg: 0.75 }).rules.every((r) => r.ok)
 */
export function checkDetailing(
  section: ResolvedSection,
  options: CheckOptions = {},
): { rules: DetailingResult[]; crossTies: CrossTieCount } {
  // A resolved section is immutable once built (the interaction kernel caches on it too), so
  // the rules are cached per section and options: searches re-check one section many times.
  const key = `${options.rhoMax ?? ""}|${options.dagg ?? ""}|${options.exposure ?? ""}|${options.displayUnits ?? "US"}`;
  const hit = cache.get(section);
  if (hit !== undefined && hit.key === key) return { rules: hit.rules.slice(), crossTies: hit.crossTies };
  const result = computeDetailing(section, options);
  cache.set(section, { key, rules: result.rules, crossTies: result.crossTies });
  return { rules: result.rules.slice(), crossTies: result.crossTies };
}

const cache = new WeakMap<ResolvedSection, { key: string; rules: DetailingResult[]; crossTies: CrossTieCount }>();

function computeDetailing(section: ResolvedSection, options: CheckOptions): { rules: DetailingResult[]; crossTies: CrossTieCount } {
  const rules: DetailingResult[] = [...checkSteelRatio(section, options.rhoMax)];
  rules.push(checkBarCount(section));
  const units = options.displayUnits ?? "US";
  rules.push(checkClearSpacing(section, options.dagg ?? 0.75, units));
  rules.push(checkCover(section, options.exposure ?? "interior", units));
  const crossTies = countCrossTies(section);
  if (section.confinement === "spiral") {
    rules.push(...checkSpiral(section, barProperties(section.tie.size).area, options.dagg ?? 0.75, units));
  } else {
    rules.push(...checkTies(section, units));
  }
  rules.push(checkLateralSupport(section, crossTies));
  return { rules, crossTies };
}
