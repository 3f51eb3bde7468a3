/** Schema of a price book as sent with a check or search (cli-contract.md § optimize, `prices`). */
import { z } from "zod";
import type { Prices } from "../../engine/types";
import { byStrength, nonNegative } from "./common";

export const pricesSchema = z
  .object({
    concrete: byStrength("concrete price"),
    steel: nonNegative("steel price"),
    formwork: nonNegative("formwork price"),
    roundFormwork: nonNegative("round formwork price"),
    brace: nonNegative("brace price"),
  })
  .strict();

export type _PricesFit = z.infer<typeof pricesSchema> extends Prices ? true : never;
