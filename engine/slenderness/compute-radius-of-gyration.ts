import type { Axis, ResolvedSection } from "../types";

/**
 * Radius of gyration for slenderness, in (6.2.5.2): 0.30 h for a rectangle (h the
 * dimension in the direction stability is considered), 0.25 D for a circle, or
 * √(Ig/Ag) of the gross concrete section.
 *
 * @param section resolved section (in)
 * @param axis bending axis: "x" uses the depth h (y extent), "y" the width b
 * @param method "approx" (default) or "gross"
 * @returns r, in
 * @example computeRadiusOfGyration(sec18x22, "x") // 0.30 × 22 = 6.6 in
 */
export function computeRadiusOfGyration(
  section: ResolvedSection,
  axis: Axis,
  method: "approx" | "gross" = "approx",
): number {
  if (method === "gross") return Math.sqrt((axis === "x" ? section.Igx : section.Igy) / section.Ag);
  if (section.shape === "circle") return 0.25 * section.D;
  return 0.3 * (axis === "x" ? section.h : section.b);
}
