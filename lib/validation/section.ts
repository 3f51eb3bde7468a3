/**
 * Schema of a section as given (cli-contract.md § check, `section`). Geometry that needs the
 * bar tables (a bar outside the outline) is checked by the engine's resolveSection, whose
 * RangeError names the path.
 */
import { z } from "zod";
import type { SectionInput } from "../../engine/types";
import { barSizeSchema, finite, nonNegative, positive } from "./common";

const count = (what: string, min: number) =>
  z.number({ error: `${what} must be a whole number` }).int(`${what} must be a whole number`).min(min, `${what} must be ≥ ${min}`).max(200, `${what} must be ≤ 200`);

export const barSchema = z.object({ x: finite("bar x"), y: finite("bar y"), size: barSizeSchema }).strict();

export const layoutSchema = z.discriminatedUnion(
  "type",
  [
    z.object({ type: z.literal("perimeter"), size: barSizeSchema, nb: count("nb", 2), nh: count("nh", 2) }).strict(),
    z.object({ type: z.literal("faces"), size: barSizeSchema, n: count("n", 2) }).strict(),
    z.object({ type: z.literal("circle"), size: barSizeSchema, n: count("n", 3) }).strict(),
  ],
  { error: 'layout.type must be "perimeter", "faces" or "circle"' },
);

export const tieSchema = z.object({ size: barSizeSchema, spacing: positive("tie spacing") }).strict();

export const sectionSchema = z
  .object({
    shape: z.enum(["rect", "circle"], { error: 'shape must be "rect" or "circle"' }),
    b: positive("b").optional(),
    h: positive("h").optional(),
    D: positive("D").optional(),
    fc: positive("fc"),
    fy: positive("fy"),
    confinement: z.enum(["tied", "spiral"], { error: 'confinement must be "tied" or "spiral"' }),
    cover: nonNegative("cover"),
    bars: z.array(barSchema).min(1, "bars must hold at least one bar").max(200).optional(),
    layout: layoutSchema.optional(),
    tie: tieSchema.optional(),
  })
  .strict()
  .superRefine((s, ctx) => {
    if (s.shape === "rect") {
      if (s.b === undefined) ctx.addIssue({ code: "custom", path: ["b"], message: "b is required for a rectangular section" });
      if (s.h === undefined) ctx.addIssue({ code: "custom", path: ["h"], message: "h is required for a rectangular section" });
      if (s.D !== undefined) ctx.addIssue({ code: "custom", path: ["D"], message: "D belongs to circular sections" });
      if (s.layout?.type === "circle") ctx.addIssue({ code: "custom", path: ["layout", "type"], message: 'a "circle" layout needs shape "circle"' });
      if (s.confinement === "spiral") ctx.addIssue({ code: "custom", path: ["confinement"], message: "spirals are for circular sections here" });
    } else {
      if (s.D === undefined) ctx.addIssue({ code: "custom", path: ["D"], message: "D is required for a circular section" });
      if (s.b !== undefined || s.h !== undefined) ctx.addIssue({ code: "custom", path: [s.b !== undefined ? "b" : "h"], message: "b and h belong to rectangular sections" });
      if (s.layout !== undefined && s.layout.type !== "circle") ctx.addIssue({ code: "custom", path: ["layout", "type"], message: 'a circular section takes a "circle" layout' });
    }
    if (s.bars === undefined && s.layout === undefined) ctx.addIssue({ code: "custom", path: ["bars"], message: "give bars or a layout" });
    if (s.bars !== undefined && s.layout !== undefined) ctx.addIssue({ code: "custom", path: ["layout"], message: "give either bars or a layout, not both" });
  });

export type SectionRequest = z.infer<typeof sectionSchema>;
/** Compile-time proof that a parsed section fits the engine's input type. */
export type _SectionFits = SectionRequest extends SectionInput ? true : never;
