/** Schema of member data (cli-contract.md § check, `member`). */
import { z } from "zod";
import type { MemberInput } from "../../engine/types";
import { nonNegative, positive } from "./common";

export const swayAxisSchema = z.union(
  [
    z.object({ Q: nonNegative("Q (stability index)") }).strict(),
    z.object({ sumPu: nonNegative("sumPu"), sumPc: positive("sumPc") }).strict(),
  ],
  { error: "sway data per axis is { Q } or { sumPu, sumPc } (6.6.4.6.2)" },
);

export const memberSchema = z
  .object({
    lu: positive("lu"),
    lux: positive("lux").optional(),
    luy: positive("luy").optional(),
    kx: positive("kx").max(10, "kx above 10 is not a column"),
    ky: positive("ky").max(10, "ky above 10 is not a column"),
    braced: z.boolean({ error: "braced must be true or false" }),
    braceLevels: z.number({ error: "braceLevels must be a whole number" }).int("braceLevels must be a whole number").min(0, "braceLevels must be ≥ 0").max(20, "braceLevels must be ≤ 20").optional(),
    transverseLoad: z.union([z.boolean(), z.object({ x: z.boolean().optional(), y: z.boolean().optional() }).strict()]).optional(),
    sway: z.object({ x: swayAxisSchema.optional(), y: swayAxisSchema.optional() }).strict().optional(),
    pourHeight: positive("pourHeight").optional(),
  })
  .strict()
  .superRefine((m, ctx) => {
    if (!m.braced && (m.braceLevels ?? 0) > 0) {
      ctx.addIssue({ code: "custom", path: ["braceLevels"], message: "intermediate brace levels are checked for braced columns only (column-checks.md §7.8)" });
    }
    if (m.braced && m.sway !== undefined) {
      ctx.addIssue({ code: "custom", path: ["sway"], message: "sway data belongs to sway columns (braced: false)" });
    }
  });

export type MemberRequest = z.infer<typeof memberSchema>;
export type _MemberFits = MemberRequest extends MemberInput ? true : never;
