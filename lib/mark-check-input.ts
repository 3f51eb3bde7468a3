/**
 * The engine's check input for a mark as stored: its member data, load combinations, the project's
 * design settings and price book, with a given design (the mark's own, or a candidate's).
 */
import type { MarkInputs } from "@/db/queries/search-inputs";
import type { CheckInput, EiOption, LoadCase, MemberInput, Prices, CarbonFactors } from "@/engine/types";
import type { MarkDesign } from "./candidate-design";

export function buildMarkCheckInput(inputs: MarkInputs, design: MarkDesign & { ei?: EiOption }): CheckInput {
  const stored = inputs.mark.member as MemberInput & { psi?: unknown };
  const { psi: _psi, ...member } = stored;
  const loads: LoadCase[] = inputs.loads.map((l) => ({
    name: l.name,
    Pu: l.Pu,
    betaDns: l.betaDns,
    Mx: l.Mx as LoadCase["Mx"],
    ...(l.My ? { My: l.My as NonNullable<LoadCase["My"]> } : {}),
  }));
  return {
    section: design.section,
    member: { ...member, braceLevels: design.braceLevels },
    options: {
      ei: design.ei ?? (inputs.project.eiOption as EiOption),
      dagg: inputs.project.dagg,
      exposure: inputs.project.exposure as "interior" | "exposed" | "earth",
    },
    loads,
    ...(inputs.priceBook
      ? { prices: inputs.priceBook.prices as Prices, carbon: inputs.priceBook.carbon as CarbonFactors }
      : {}),
  };
}
