/**
 * The live check of a mark's stored design, shared by the column schedule and the calculation
 * package so both always show the same numbers: the engine's member check with the project's
 * settings and the latest price book. A mark without load combinations still has quantities
 * and cost (they depend on the section and length only) but no verdict.
 */
import type { MarkInputs } from "@/db/queries/search-inputs";
import { buildMarkCheckInput } from "@/lib/mark-check-input";
import type { MarkDesign } from "@/lib/candidate-design";
import {
  checkDetailing,
  checkMember,
  computeCost,
  computeQuantities,
  resolveSection,
  type CheckInput,
  type CheckOutput,
  type CostBreakdown,
  type CostLine,
  type DetailingResult,
  type EiOption,
  type Quantities,
  type ResolvedSection,
} from "@/engine";

export type StoredDesign = MarkDesign & { ei?: EiOption };

export interface StoredDesignCheck {
  design: StoredDesign;
  input: CheckInput;
  /** the resolved section (bars with diameters, tie, Ag, ...); null when the design is invalid */
  section: ResolvedSection | null;
  /** the full member check; null without load combinations or for an invalid design */
  output: CheckOutput | null;
  quantities: Quantities | null;
  /** detailing rules of the section (available without loads too) */
  detailing: DetailingResult[] | null;
  cost: { total: number; breakdown: CostBreakdown; lines: CostLine[] } | null;
  /** why there is no verdict (no loads, invalid stored design, missing price), else null */
  problem: string | null;
}

export function readStoredDesign(inputs: MarkInputs): StoredDesign {
  const raw = (inputs.mark.design ?? {}) as Partial<StoredDesign>;
  if (!raw.section) throw new TypeError(`column mark ${inputs.mark.label} has no design section`);
  return { section: raw.section, braceLevels: raw.braceLevels ?? 0, ...(raw.ei ? { ei: raw.ei } : {}) };
}

export function checkStoredDesign(inputs: MarkInputs): StoredDesignCheck {
  const design = readStoredDesign(inputs);
  const input = buildMarkCheckInput(inputs, design);
  let section: ResolvedSection;
  try {
    section = resolveSection(input.section);
  } catch (error) {
    return { design, input, section: null, output: null, quantities: null, detailing: null, cost: null, problem: `the stored design is not a valid section: ${messageOf(error)}` };
  }
  if (input.loads.length === 0) {
    // quantities and cost do not depend on the loads: still schedule them
    try {
      const { rules, crossTies } = checkDetailing(section, input.options ?? {});
      const q = computeQuantities(section, input.member, crossTies);
      const quantities: Quantities = { concreteYd3: q.concreteYd3, steelLb: q.steelLb, formFt2: q.formFt2, ties: q.ties, crossTies: q.crossTies };
      const cost = input.prices ? computeCost(q, section.fc, design.braceLevels, input.prices) : null;
      return { design, input, section, output: null, quantities, detailing: rules, cost, problem: "no load combinations: add them to check this mark" };
    } catch (error) {
      return { design, input, section, output: null, quantities: null, detailing: null, cost: null, problem: messageOf(error) };
    }
  }
  try {
    const output = checkMember(input);
    return { design, input, section, output, quantities: output.quantities, detailing: output.section.detailing, cost: output.cost ?? null, problem: null };
  } catch (error) {
    return { design, input, section, output: null, quantities: null, detailing: null, cost: null, problem: `the check could not run: ${messageOf(error)}` };
  }
}

function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
