/**
 * The engine's check input for a mark as stored, with a given design (the mark's own, or a
 * candidate's): the stored rows handed to composeCheckInput, the one place that decides how a
 * mark, its project and its price book make a check.
 */
import type { MarkInputs } from "@/db/queries/search-inputs";
import type { CarbonFactors, CheckInput, EiOption, LoadCase, Prices } from "@/engine/types";
import { composeCheckInput, type MarkDesign as StoredDesign, type MarkMember } from "./validation/mark";
import type { MarkDesign } from "./candidate-design";

export function buildMarkCheckInput(inputs: MarkInputs, design: MarkDesign & { ei?: EiOption }): CheckInput {
  const loads: LoadCase[] = inputs.loads.map((l) => ({
    name: l.name,
    Pu: l.Pu,
    betaDns: l.betaDns,
    Mx: l.Mx as LoadCase["Mx"],
    ...(l.My ? { My: l.My as NonNullable<LoadCase["My"]> } : {}),
  }));
  return composeCheckInput({
    project: inputs.project,
    // Stored member and design rows were written through the mark schema.
    mark: { member: inputs.mark.member as MarkMember, design: design as StoredDesign },
    loads,
    priceBook: inputs.priceBook ? { prices: inputs.priceBook.prices as Prices, carbon: inputs.priceBook.carbon as CarbonFactors } : null,
  }).input;
}
