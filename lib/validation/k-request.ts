/** The `k` request: joint stiffness ratios at both ends and braced / sway (alignment chart, R6.2.5). */
import { z } from "zod";
import { nonNegative } from "./common";

export const kRequestSchema = z
  .object({
    psiA: nonNegative("psiA"),
    psiB: nonNegative("psiB"),
    sway: z.boolean().default(false),
  })
  .strict();

export type KRequest = z.infer<typeof kRequestSchema>;
