/** Words and sections for search candidates (values stored in US units, shown in the project's). */
import { designFromCandidateId, type MarkDesign } from "@/lib/candidate-design";
import { formatNumber, formatQuantity, type UnitSystem } from "@/components/projects/units";
import type { CheckInput } from "@/engine/types";
import type { CandidateRow, PriceBookRecord } from "./search-types";

/** "20 × 16 in" or "⌀ 18 in". */
export function describeOutline(c: Pick<CandidateRow, "shape" | "b" | "h" | "D">, units: UnitSystem): string {
  if (c.shape === "circle") return `⌀ ${formatQuantity(c.D ?? 0, "length", units)}`;
  return `${formatQuantity(c.b ?? 0, "length", units).replace(/ (in|mm)$/, "")} × ${formatQuantity(c.h ?? 0, "length", units)}`;
}

export function describeBars(c: Pick<CandidateRow, "bars">): string {
  return c.bars ? `${c.bars.count} ${c.bars.size}` : "—";
}

export function describeBraces(levels: number | undefined): string {
  if (!levels) return "no intermediate brace";
  return `${levels} brace level${levels > 1 ? "s" : ""}`;
}

/** "20 × 16 in · 6 #8 · f′c 6 ksi · tied · no intermediate brace" */
export function describeCandidate(c: CandidateRow, units: UnitSystem): string {
  return [
    describeOutline(c, units),
    describeBars(c),
    `f′c ${formatQuantity(c.fc ?? 0, "stress", units)}`,
    c.confinement ?? "tied",
    describeBraces(c.braceLevels),
  ].join(" · ");
}

export function formatDollars(value: number | null | undefined, digits = 0): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  return `$${value.toLocaleString("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits })}`;
}

export function formatCarbon(value: number | null | undefined): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return "—";
  return `${formatNumber(value, 0)} kgCO2e`;
}

/** The candidate's design (section in the check contract's shape and brace levels), from its id. */
export function candidateDesign(candidateId: string, cover: number): MarkDesign | null {
  try {
    return designFromCandidateId(candidateId, cover);
  } catch {
    return null;
  }
}

/**
 * The mark's check input with the candidate's design in place of the current one, priced with the
 * project's price book (whatever f'c the candidate uses).
 */
export function candidateCheckInput(base: CheckInput, design: MarkDesign, priceBook: PriceBookRecord | null): CheckInput {
  const { braceLevels: _current, ...member } = base.member;
  return {
    ...base,
    section: design.section,
    member: design.braceLevels > 0 ? { ...member, braceLevels: design.braceLevels } : member,
    ...(priceBook ? { prices: priceBook.prices, carbon: priceBook.carbon } : {}),
  };
}
