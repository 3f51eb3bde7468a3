import type { ResolvedSection } from "../types";

/**
 * The same section with its bars turned about the centroid by `angleRad`
 * (anticlockwise seen with +x right and +y up). Used for circular sections, whose
 * capacity is taken as the smaller of the layout as given and the layout turned by
 * half the bar pitch (column-checks.md §7.5). Concrete outline, materials and axial
 * strengths are unchanged; Isex and Isey are recomputed.
 *
 * @param section a resolved section (circles are the intended use; rectangles are
 *   accepted but bars may then fall outside the outline)
 * @param angleRad rotation, radians (finite)
 * @throws RangeError for a non-finite angle
 * @example rotateSection(circle8, Math.PI / 8) // the 8-bar circle turned by half a pitch
 */
export function rotateSection(section: ResolvedSection, angleRad: number): ResolvedSection {
  if (!Number.isFinite(angleRad)) throw new RangeError(`angleRad must be finite (got ${angleRad})`);
  const cs = Math.cos(angleRad);
  const sn = Math.sin(angleRad);
  let Isex = 0;
  let Isey = 0;
  const bars = section.bars.map((bar) => {
    const x = bar.x * cs - bar.y * sn;
    const y = bar.x * sn + bar.y * cs;
    Isex += bar.area * y * y;
    Isey += bar.area * x * x;
    return { ...bar, x, y };
  });
  return { ...section, tie: { ...section.tie }, bars, Isex, Isey };
}
