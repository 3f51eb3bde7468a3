/** Schema of carbon factors (cli-contract.md § optimize, `carbon`). */
import { z } from "zod";
import type { CarbonFactors } from "../../engine/types";
import { byStrength, nonNegative } from "./common";

export const carbonSchema = z
  .object({
    concrete: byStrength("concrete carbon factor"),
    steel: nonNegative("steel carbon factor"),
  })
  .strict();

export type _CarbonFits = z.infer<typeof carbonSchema> extends CarbonFactors ? true : never;
