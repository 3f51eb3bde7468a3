/**
 * A project's price book and carbon factors (product.md, flow step 2; column-checks.md §6).
 * Stored in US units ($/yd³ keyed by f'c in ksi, $/lb, $/ft², $ per brace level;
 * kgCO2e/yd³ and kgCO2e/lb). Every edit writes a new revision; results name the revision
 * they used. The price and carbon shapes are the optimize contract's (one schema, reused).
 */
import { z } from "zod";
import { carbonSchema } from "./carbon";
import { pricesSchema } from "./prices";
import type { CarbonFactors, Prices } from "@/engine/types";

/** Starting unit prices for a new project: placeholders to be replaced by the estimator (invented, not market data). */
export const DEFAULT_PRICES: Prices = {
  concrete: { "4": 190, "5": 200, "6": 215, "8": 245 },
  steel: 1.15,
  formwork: 13.5,
  roundFormwork: 18,
  brace: 2400,
};

/** Starting carbon factors: typical industry averages (from memory), editable per project. */
export const DEFAULT_CARBON: CarbonFactors = {
  concrete: { "4": 260, "5": 290, "6": 320, "8": 380 },
  steel: 0.4,
};

export const priceBookWriteSchema = z
  .object({
    /** the revision the editor started from; a newer one on the server means 409 */
    baseRevision: z.number().int().min(0, "baseRevision is the revision you read (0 for none)"),
    prices: pricesSchema,
    carbon: carbonSchema,
    /** $ per distinct form set (standardization) */
    formSet: z.number().min(0, "form set price must be ≥ 0").default(0),
  })
  .strict()
  .superRefine((book, ctx) => {
    if (Object.keys(book.prices.concrete).length === 0) {
      ctx.addIssue({ code: "custom", path: ["prices", "concrete"], message: "give a concrete price for at least one f'c" });
    }
    for (const key of Object.keys(book.prices.concrete)) {
      if (book.carbon.concrete[key] === undefined) {
        ctx.addIssue({ code: "custom", path: ["carbon", "concrete", key], message: `no carbon factor for f'c ${key} ksi` });
      }
    }
  });

export type PriceBookWrite = z.infer<typeof priceBookWriteSchema>;
