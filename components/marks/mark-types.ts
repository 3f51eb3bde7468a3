/** Client-side shapes of marks and load combinations as the routes return them (US units). */
import type { CheckInput, CheckOutput, LoadCase, SectionInput } from "@/engine/types";
import type { MarkDesign, MarkLimits, MarkMember } from "@/lib/validation/mark";
import { formatQuantity, type UnitSystem } from "@/components/projects/units";

export interface MarkRecord {
  id: string;
  projectId: string;
  label: string;
  level: string;
  quantity: number;
  member: MarkMember;
  limits: MarkLimits;
  design: MarkDesign;
  version: number;
  updatedAt: string;
  loads?: number;
}

export interface LoadRecord extends LoadCase {
  id: string;
  markId: string;
  position: number;
  importId: string | null;
  version: number;
}

export interface CheckInputResponse {
  input: CheckInput;
  notes: string[];
  priceBook: { id: string; revision: number } | null;
  mark: { id: string; label: string; level: string; version: number; quantity: number; limits: MarkLimits };
  project: { id: string; name: string; units: UnitSystem; codeBasis: string };
}

export type { CheckOutput, SectionInput };

/** "16 × 20 in · 10 #8 · f′c 5 ksi · tied" */
export function describeSection(s: SectionInput, units: UnitSystem): string {
  const size =
    s.shape === "circle"
      ? `⌀ ${formatQuantity(s.D ?? 0, "length", units)}`
      : `${formatQuantity(s.b ?? 0, "length", units).replace(/ (in|mm)$/, "")} × ${formatQuantity(s.h ?? 0, "length", units)}`;
  let bars = "";
  if (s.layout?.type === "perimeter") bars = `${2 * s.layout.nb + 2 * (s.layout.nh - 2)} ${s.layout.size}`;
  else if (s.layout?.type === "faces") bars = `${2 * s.layout.n} ${s.layout.size}`;
  else if (s.layout?.type === "circle") bars = `${s.layout.n} ${s.layout.size}`;
  else if (s.bars) bars = `${s.bars.length} bars`;
  return `${size} · ${bars} · f′c ${formatQuantity(s.fc, "stress", units)} · ${s.confinement}`;
}
