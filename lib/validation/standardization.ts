import { z } from "zod";

export const standardizationQuerySchema = z
  .object({
    oneFcPerLevel: z.boolean().default(false),
    rotatedShareForms: z.boolean().default(true),
  })
  .strict();

export const adoptStandardizationSchema = standardizationQuerySchema.extend({
  maxOutlines: z.number({ error: "maxOutlines must be a number" }).int("maxOutlines is a whole number").min(1, "at least one outline"),
  comment: z.string().max(2000, "at most 2000 characters").default(""),
});
