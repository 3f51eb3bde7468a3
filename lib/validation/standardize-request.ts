/**
 * The `standardize` request: every mark's passing candidates (optimize front entries as they
 * are; fields not read here are kept and come back in the assignment), the number of distinct
 * outlines allowed and the price book's form-set cost. Shared by the CLI and the project route.
 *
 * Either `maxOutlines` (one solve) or `"sweep": true` (one solve per N = 1 … number of marks).
 */
import { z } from "zod";
import { finite, nonNegative, positive } from "./common";

export const standardizeCandidateSchema = z
  .looseObject({
    id: z.string({ error: "id must be a string" }).min(1, "a candidate needs an id"),
    shape: z.enum(["rect", "circle"], { error: 'shape must be "rect" or "circle"' }),
    b: positive("b").optional(),
    h: positive("h").optional(),
    D: positive("D").optional(),
    fc: positive("fc"),
    cost: nonNegative("cost"),
    utilization: nonNegative("utilization"),
    pass: z.boolean({ error: "pass must be true or false" }).optional(),
  })
  .superRefine((c, ctx) => {
    if (c.shape === "rect") {
      if (c.b === undefined) ctx.addIssue({ code: "custom", path: ["b"], message: "a rectangle needs b" });
      if (c.h === undefined) ctx.addIssue({ code: "custom", path: ["h"], message: "a rectangle needs h" });
    } else if (c.D === undefined) {
      ctx.addIssue({ code: "custom", path: ["D"], message: "a circle needs D" });
    }
  });

export const standardizeMarkSchema = z
  .object({
    id: z.string({ error: "id must be a string" }).min(1, "a mark needs an id").max(80),
    /** shown in reasons and tables; defaults to the id */
    label: z.string().min(1).max(80).optional(),
    level: z.union([z.string().min(1, "level must not be empty").max(80), finite("level")], { error: "level must be a string or a number" }).optional(),
    quantity: finite("quantity").int("quantity must be a whole number").min(1, "quantity must be ≥ 1"),
    candidates: z.array(standardizeCandidateSchema, { error: "candidates must be an array" }).max(5000, "at most 5000 candidates per mark"),
  })
  .strict();

export const standardizeRequestSchema = z
  .object({
    marks: z.array(standardizeMarkSchema, { error: "marks must be an array" }).min(1, "a project needs at least one mark").max(500, "at most 500 marks"),
    maxOutlines: finite("maxOutlines").int("maxOutlines must be a whole number").min(1, "maxOutlines must be ≥ 1").optional(),
    formSetCost: nonNegative("formSetCost"),
    oneFcPerLevel: z.boolean({ error: "oneFcPerLevel must be true or false" }).optional(),
    rotatedShareForms: z.boolean({ error: "rotatedShareForms must be true or false" }).optional(),
    sweep: z.boolean({ error: "sweep must be true or false" }).optional(),
  })
  .strict()
  .superRefine((r, ctx) => {
    if (r.maxOutlines === undefined && r.sweep !== true) {
      ctx.addIssue({ code: "custom", path: ["maxOutlines"], message: 'give maxOutlines, or "sweep": true for every N' });
    }
    const seen = new Map<string, number>();
    r.marks.forEach((m, i) => {
      const first = seen.get(m.id);
      if (first !== undefined) ctx.addIssue({ code: "custom", path: ["marks", i, "id"], message: `mark id ${m.id} is also marks.${first}.id` });
      else seen.set(m.id, i);
      const ids = new Map<string, number>();
      m.candidates.forEach((c, j) => {
        const f = ids.get(c.id);
        if (f !== undefined) ctx.addIssue({ code: "custom", path: ["marks", i, "candidates", j, "id"], message: `candidate id ${c.id} is also candidates.${f}.id` });
        else ids.set(c.id, j);
      });
    });
  });

export type StandardizeRequest = z.infer<typeof standardizeRequestSchema>;
