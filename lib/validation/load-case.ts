/**
 * Schema of a factored load case (cli-contract.md § check, `loads[]`). End moments are
 * magnitudes with M1 ≤ M2 and a curvature (column-checks.md §3).
 */
import { z } from "zod";
import type { LoadCase } from "../../engine/types";
import { finite, nonNegative } from "./common";

export const endMomentsSchema = z
  .object({
    M1: nonNegative("M1 (a magnitude)"),
    M2: nonNegative("M2 (a magnitude)"),
    curvature: z.enum(["single", "double"], { error: 'curvature must be "single" or "double"' }),
    M1s: nonNegative("M1s (a magnitude)").optional(),
    M2s: nonNegative("M2s (a magnitude)").optional(),
  })
  .strict()
  .superRefine((m, ctx) => {
    if (m.M1 > m.M2) {
      ctx.addIssue({ code: "custom", path: ["M1"], message: `M1 = ${m.M1} exceeds M2 = ${m.M2}: M1 is the smaller end moment magnitude (column-checks.md §3)` });
    }
  });

export const loadCaseSchema = z
  .object({
    name: z.string({ error: "name must be a string" }).min(1, "a load case needs a name").max(80, "name is at most 80 characters"),
    Pu: finite("Pu (kip or kN, compression positive)"),
    betaDns: finite("betaDns").min(0, "betaDns must be between 0 and 1 (6.6.4.4.4)").max(1, "betaDns must be between 0 and 1 (6.6.4.4.4)"),
    Mx: endMomentsSchema,
    My: endMomentsSchema.optional(),
  })
  .strict();

export type LoadCaseRequest = z.infer<typeof loadCaseSchema>;
export type _LoadCaseFits = LoadCaseRequest extends LoadCase ? true : never;
