import { z } from "zod";

export const proposeAlternativeSchema = z
  .object({
    searchId: z.uuid("searchId must be a search id"),
    candidateId: z.string().min(1, "candidateId is required").max(120, "at most 120 characters"),
    comment: z.string().max(2000, "at most 2000 characters").default(""),
  })
  .strict();

export const decideAlternativeSchema = z
  .object({
    decision: z.enum(["approve", "reject"], { error: 'decision must be "approve" or "reject"' }),
    version: z.number().int().min(1, "version is the one you read"),
    comment: z.string().max(2000, "at most 2000 characters").default(""),
  })
  .strict()
  .superRefine((d, ctx) => {
    if (d.decision === "reject" && d.comment.trim() === "") {
      ctx.addIssue({ code: "custom", path: ["comment"], message: "say why the alternative is rejected" });
    }
  });
