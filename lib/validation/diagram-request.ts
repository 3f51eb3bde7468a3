/** The `diagram` request (cli-contract.md § diagram): a section, the axis and the point count. */
import { z } from "zod";
import { unitsSchema } from "./common";
import { addStrengthIssues } from "./check-request";
import { sectionSchema } from "./section";

export const diagramRequestSchema = z
  .object({
    units: unitsSchema.optional(),
    section: sectionSchema,
    axis: z.enum(["x", "y"], { error: 'axis must be "x" or "y"' }).default("x"),
    points: z.number({ error: "points must be a whole number" }).int("points must be a whole number").min(8, "points must be ≥ 8").max(2000, "points must be ≤ 2000").default(60),
    sense: z.union([z.literal(1), z.literal(-1)], { error: "sense must be 1 or -1" }).optional(),
  })
  .strict()
  .superRefine((req, ctx) => addStrengthIssues(req.section, req.units === "SI", ctx));

export type DiagramRequest = z.infer<typeof diagramRequestSchema>;
