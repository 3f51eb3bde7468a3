/**
 * A column mark (product.md, flow step 3): label, level, number of identical columns, member data
 * (unbraced lengths, braced or sway, k given or from ψ at both ends, transverse load), the
 * architect's section limits, and the current design (a section in the contract shape plus brace
 * levels). Stored in the engine's units (in, ksi); SI is converted at the edges only.
 */
import { z } from "zod";
import { sectionSchema } from "./section";
import { solveEffectiveLength } from "@/engine/effective-length";
import type { CarbonFactors, CheckInput, CheckOptions, EiOption, LoadCase, MemberInput, Prices, SectionInput } from "@/engine/types";

const positive = (what: string) => z.number({ error: `${what} must be a number` }).positive(`${what} must be > 0`);
const nonNegative = (what: string) => z.number({ error: `${what} must be a number` }).min(0, `${what} must be ≥ 0`);

/** ψ at the two ends of the column for one axis (top = joint A, bottom = joint B). */
const psiPairSchema = z
  .object({
    top: nonNegative("ψ at the top").max(1000, "ψ above 1000: treat the end as pinned (ψ = 10, common practice)"),
    bottom: nonNegative("ψ at the bottom").max(1000, "ψ above 1000: treat the end as pinned (ψ = 10, common practice)"),
  })
  .strict();

const swayAxisSchema = z.union([
  z.object({ Q: nonNegative("stability index Q").max(1, "Q ≥ 1 means the story is unstable") }).strict(),
  z.object({ sumPu: nonNegative("ΣPu"), sumPc: positive("ΣPc") }).strict(),
]);

export const markMemberSchema = z
  .object({
    /** clear height, in */
    lu: positive("ℓu").max(1200, "ℓu above 100 ft is not a column"),
    lux: positive("ℓu about x").max(1200, "ℓu above 100 ft is not a column").optional(),
    luy: positive("ℓu about y").max(1200, "ℓu above 100 ft is not a column").optional(),
    kx: positive("kx").max(10, "kx above 10 is not a column").default(1),
    ky: positive("ky").max(10, "ky above 10 is not a column").default(1),
    braced: z.boolean().default(true),
    /** when given for an axis, k about that axis is computed from ψ (alignment-chart equations, R6.2.5) */
    psi: z.object({ x: psiPairSchema.optional(), y: psiPairSchema.optional() }).strict().optional(),
    transverseLoad: z.union([z.boolean(), z.object({ x: z.boolean().optional(), y: z.boolean().optional() }).strict()]).default(false),
    sway: z.object({ x: swayAxisSchema.optional(), y: swayAxisSchema.optional() }).strict().optional(),
    pourHeight: positive("pour height").optional(),
  })
  .strict()
  .superRefine((m, ctx) => {
    if (m.braced && m.sway !== undefined) {
      ctx.addIssue({ code: "custom", path: ["sway"], message: "story stability data (Q or ΣPu, ΣPc) belongs to sway columns: untick braced or remove it" });
    }
  });

export const markLimitsSchema = z
  .object({
    maxB: positive("maximum b").optional(),
    maxH: positive("maximum h").optional(),
    maxD: positive("maximum D").optional(),
    squareOnly: z.boolean().optional(),
    note: z.string().max(500, "at most 500 characters").optional(),
  })
  .strict();

export const markDesignSchema = z
  .object({
    section: sectionSchema,
    braceLevels: z.number().int("brace levels are whole numbers").min(0).max(6, "at most 6 brace levels").default(0),
    /** overrides the project's default EI option for this mark */
    ei: z.enum(["a", "b", "c"]).optional(),
  })
  .strict();

const markFields = {
  label: z.string().trim().min(1, "a mark needs a label (grid or stack, e.g. C-4)").max(40, "at most 40 characters"),
  level: z.string().trim().max(40, "at most 40 characters"),
  quantity: z.number({ error: "quantity must be a number" }).int("quantity is a whole number").min(1, "at least one column").max(10000),
};

export const markCreateSchema = z
  .object({
    label: markFields.label,
    level: markFields.level.default(""),
    quantity: markFields.quantity.default(1),
    member: markMemberSchema,
    limits: markLimitsSchema.default({}),
    design: markDesignSchema,
  })
  .strict();

export const markUpdateSchema = z
  .object({
    version: z.number().int().min(1, "version is the one you read"),
    label: markFields.label.optional(),
    level: markFields.level.optional(),
    quantity: markFields.quantity.optional(),
    member: markMemberSchema.optional(),
    limits: markLimitsSchema.optional(),
    design: markDesignSchema.optional(),
  })
  .strict();

export type MarkMember = z.infer<typeof markMemberSchema>;
export type MarkLimits = z.infer<typeof markLimitsSchema>;
export type MarkDesign = z.infer<typeof markDesignSchema>;
export type MarkCreate = z.infer<typeof markCreateSchema>;
export type MarkUpdate = z.infer<typeof markUpdateSchema>;

/** Compile-time proof that the stored design and member fit the engine's input types. */
export type _SectionFits = MarkDesign["section"] extends SectionInput ? true : never;
export type _MemberFits = Omit<MarkMember, "psi"> extends Omit<MemberInput, "braceLevels"> ? true : never;

/**
 * k about each axis where ψ is given: the alignment-chart equations (braced 0.5 ≤ k ≤ 1, sway
 * k ≥ 1; commentary R6.2.5), rounded to 0.001 so a stored k reads back as shown.
 */
export function applyPsi(member: MarkMember): MarkMember {
  const out: MarkMember = { ...member };
  const sway = !member.braced;
  if (member.psi?.x) out.kx = roundK(solveEffectiveLength(member.psi.x.top, member.psi.x.bottom, sway));
  if (member.psi?.y) out.ky = roundK(solveEffectiveLength(member.psi.y.top, member.psi.y.bottom, sway));
  return out;
}

function roundK(k: number): number {
  return Math.round(k * 1000) / 1000;
}

export interface CheckInputSources {
  project: { eiOption: string; dagg: number; exposure: string };
  mark: { member: MarkMember; design: MarkDesign };
  loads: LoadCase[];
  priceBook: { prices: Prices; carbon: CarbonFactors } | null;
}

/**
 * The contract's check JSON (US units) for a mark's current design: the project supplies the EI
 * option (unless the mark overrides it), aggregate size and exposure; the latest price book the
 * prices, when it has one for the design's f'c.
 */
export function composeCheckInput({ project, mark, loads, priceBook }: CheckInputSources): { input: CheckInput; notes: string[] } {
  const m = mark.member;
  const member: MemberInput = { lu: m.lu, kx: m.kx, ky: m.ky, braced: m.braced };
  if (m.lux !== undefined) member.lux = m.lux;
  if (m.luy !== undefined) member.luy = m.luy;
  if (m.braced && mark.design.braceLevels > 0) member.braceLevels = mark.design.braceLevels;
  if (m.transverseLoad !== false) member.transverseLoad = m.transverseLoad;
  if (!m.braced && m.sway) member.sway = m.sway;
  if (m.pourHeight !== undefined) member.pourHeight = m.pourHeight;
  const ei = (mark.design.ei ?? project.eiOption) as EiOption;
  const exposure = project.exposure as NonNullable<CheckOptions["exposure"]>;
  const notes: string[] = [];
  const input: CheckInput = { section: mark.design.section, member, options: { ei, dagg: project.dagg, exposure }, loads };
  const fcKey = Object.keys(priceBook?.prices.concrete ?? {}).find((k) => Math.abs(Number(k) - mark.design.section.fc) < 1e-6);
  if (priceBook && fcKey !== undefined && priceBook.carbon.concrete[fcKey] !== undefined) {
    input.prices = priceBook.prices;
    input.carbon = priceBook.carbon;
  } else if (priceBook) {
    notes.push(`the price book has no concrete price or carbon factor for f'c ${mark.design.section.fc} ksi: no cost shown`);
  }
  return { input, notes };
}
