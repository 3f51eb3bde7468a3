/** One-line descriptions of a design for schedules and report headings. */
import type { ResolvedSection, SectionInput } from "@/engine";

/** Bar counts per size, largest count first: "8 #8" or "4 #9 + 4 #7". */
export function describeBars(section: Pick<ResolvedSection, "bars">): string {
  const counts = new Map<string, number>();
  for (const bar of section.bars) counts.set(bar.size, (counts.get(bar.size) ?? 0) + 1);
  return [...counts.entries()]
    .sort((a, b) => b[1] - a[1] || a[0].localeCompare(b[0]))
    .map(([size, n]) => `${n} ${size}`)
    .join(" + ");
}

export function describeShape(section: Pick<SectionInput, "shape" | "b" | "h" | "D">): string {
  return section.shape === "circle" ? `${fmt(section.D)} in dia.` : `${fmt(section.b)}×${fmt(section.h)} in`;
}

/** e.g. "18×22 in, 8 #8, f'c 5 ksi, fy 60 ksi, tied, 1 brace level" */
export function describeDesign(section: ResolvedSection | null, input: SectionInput, braceLevels: number): string {
  const parts = [describeShape(input)];
  if (section) parts.push(describeBars(section));
  parts.push(`f'c ${fmt(input.fc)} ksi`, `fy ${fmt(input.fy)} ksi`, input.confinement);
  parts.push(braceLevels === 0 ? "no brace" : `${braceLevels} brace level${braceLevels > 1 ? "s" : ""}`);
  return parts.join(", ");
}

function fmt(v: number | undefined): string {
  return v === undefined ? "?" : String(Math.round(v * 1000) / 1000);
}
