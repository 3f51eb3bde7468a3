/**
 * The `optimize` request (cli-contract.md § optimize): one column's member data, load cases,
 * price book, carbon factors and the candidate space to search. Shared by the CLI, the API
 * route, the pg-boss job and the worker threads.
 *
 * Defaults (the documented default space, used when `space` or a field of it is absent):
 * rectangles b, h 12–36 in step 2 and circles D 12–36 in step 2, f'c 4/5/6/8 ksi, fy 60 ksi,
 * bars #6–#11, 0–2 brace levels, cover 1.5 in, ρmax 0.04 (common practice, so lap splices
 * fit), dagg 0.75 in, tied confinement.
 */
import { z } from "zod";
import { isBarSize } from "../../engine/rebar";
import type { BarSize, CarbonFactors, LoadCase, MemberInput, Prices } from "../../engine/types";

const positive = (what: string) => z.number({ error: `${what} must be a number` }).positive(`${what} must be > 0`);
const nonNegative = (what: string) => z.number({ error: `${what} must be a number` }).min(0, `${what} must be ≥ 0`);

const curvature = z.enum(["single", "double"], { error: 'curvature must be "single" or "double"' });

const endMomentsSchema = z
  .object({
    M1: nonNegative("M1 (a magnitude)"),
    M2: nonNegative("M2 (a magnitude)"),
    curvature,
    M1s: nonNegative("M1s (a magnitude)").optional(),
    M2s: nonNegative("M2s (a magnitude)").optional(),
  })
  .strict()
  .superRefine((m, ctx) => {
    if (m.M1 > m.M2) ctx.addIssue({ code: "custom", path: ["M1"], message: "M1 must be ≤ M2 (magnitudes, M1 the smaller end moment)" });
  });

export const loadCaseSchema = z
  .object({
    name: z.string().min(1, "a load case needs a name").max(80),
    Pu: nonNegative("Pu (compression positive)"),
    betaDns: z.number().min(0, "betaDns must be between 0 and 1").max(1, "betaDns must be between 0 and 1"),
    Mx: endMomentsSchema,
    My: endMomentsSchema.optional(),
  })
  .strict();

const swayAxisSchema = z.union([
  z.object({ Q: nonNegative("Q") }).strict(),
  z.object({ sumPu: nonNegative("sumPu"), sumPc: positive("sumPc") }).strict(),
]);

export const optimizeMemberSchema = z
  .object({
    lu: positive("lu"),
    lux: positive("lux").optional(),
    luy: positive("luy").optional(),
    kx: positive("kx").max(10, "kx above 10 is not a column"),
    ky: positive("ky").max(10, "ky above 10 is not a column"),
    braced: z.boolean(),
    braceLevels: z.never({ error: "brace levels are searched: give them as space.braceLevels" }).optional(),
    transverseLoad: z.union([z.boolean(), z.object({ x: z.boolean().optional(), y: z.boolean().optional() }).strict()]).optional(),
    sway: z.object({ x: swayAxisSchema.optional(), y: swayAxisSchema.optional() }).strict().optional(),
    pourHeight: positive("pourHeight").optional(),
  })
  .strict();

const priceByFc = z.record(z.string().regex(/^\d+(\.\d+)?$/, "keys are f'c values"), nonNegative("price"));

export const pricesSchema = z
  .object({
    concrete: priceByFc,
    steel: nonNegative("steel price"),
    formwork: nonNegative("formwork price"),
    roundFormwork: nonNegative("round formwork price"),
    brace: nonNegative("brace price"),
  })
  .strict();

export const carbonSchema = z
  .object({
    concrete: z.record(z.string().regex(/^\d+(\.\d+)?$/, "keys are f'c values"), nonNegative("carbon factor")),
    steel: nonNegative("steel carbon factor"),
  })
  .strict();

const range = (what: string) =>
  z
    .tuple([positive(`${what} low`), positive(`${what} high`), positive(`${what} step`)], {
      error: `${what} is an inclusive range [low, high, step]`,
    })
    .superRefine(([lo, hi, step], ctx) => {
      if (hi < lo) ctx.addIssue({ code: "custom", message: `${what}: high (${hi}) is below low (${lo})` });
      else if ((hi - lo) / step > 200) ctx.addIssue({ code: "custom", message: `${what}: more than 200 values; widen the step` });
    });

const barSize = z.string().refine(isBarSize, { message: "unknown bar size (expected #3…#18 or metric 10…57)" }).transform((s) => s as BarSize);

export const DEFAULT_SPACE = {
  shapes: ["rect", "circle"] as Array<"rect" | "circle">,
  b: [12, 36, 2] as [number, number, number],
  h: [12, 36, 2] as [number, number, number],
  D: [12, 36, 2] as [number, number, number],
  fc: [4, 5, 6, 8],
  fy: [60],
  sizes: ["#6", "#7", "#8", "#9", "#10", "#11"] as BarSize[],
  braceLevels: [0, 1, 2],
  cover: 1.5,
  rhoMax: 0.04,
  dagg: 0.75,
  confinement: ["tied"] as Array<"tied" | "spiral">,
};

export const spaceSchema = z
  .object({
    shapes: z.array(z.enum(["rect", "circle"])).min(1, "at least one shape").optional(),
    b: range("b").optional(),
    h: range("h").optional(),
    D: range("D").optional(),
    fc: z.array(positive("f'c")).min(1).max(12).optional(),
    fy: z.array(positive("fy")).min(1).max(6).optional(),
    sizes: z.array(barSize).min(1).max(11).optional(),
    braceLevels: z.array(z.number().int("brace levels are whole numbers").min(0).max(6, "at most 6 brace levels")).min(1).max(7).optional(),
    cover: positive("cover").optional(),
    rhoMax: z.number().min(0.01, "rhoMax must be at least the 0.01 minimum (10.6.1.1)").max(0.08, "rhoMax cannot exceed 0.08 (10.6.1.1)").optional(),
    dagg: positive("dagg").optional(),
    confinement: z.array(z.enum(["tied", "spiral"])).min(1).optional(),
    /** architect's limit: no plan dimension (b, h or D) above this */
    maxWidth: positive("maxWidth").optional(),
    /** rectangles with b = h only (values from the b range) */
    squareOnly: z.boolean().optional(),
  })
  .strict();

export const optimizeRequestSchema = z
  .object({
    units: z.enum(["US", "SI"]).optional(),
    member: optimizeMemberSchema,
    loads: z.array(loadCaseSchema).min(1, "at least one load case").max(200, "at most 200 load cases"),
    prices: pricesSchema,
    carbon: carbonSchema,
    space: spaceSchema.optional(),
    options: z
      .object({ ei: z.enum(["a", "b", "c"]).optional(), exposure: z.enum(["interior", "exposed", "earth"]).optional() })
      .strict()
      .optional(),
    threads: z.number().int().min(1, "threads ≥ 1").max(64).optional(),
  })
  .strict()
  .superRefine((req, ctx) => {
    const space = req.space ?? {};
    const si = req.units === "SI";
    const fyLimit = si ? 551.6 : 80;
    (space.fy ?? DEFAULT_SPACE.fy).forEach((fy, i) => {
      if (fy > fyLimit) {
        ctx.addIssue({ code: "custom", path: ["space", "fy", i], message: `fy above ${si ? "551.6 MPa" : "80 ksi"} is not allowed for longitudinal bars (Table 20.2.2.4(a))` });
      }
    });
    const names = new Set<string>();
    req.loads.forEach((l, i) => {
      if (names.has(l.name)) ctx.addIssue({ code: "custom", path: ["loads", i, "name"], message: `duplicate load case name "${l.name}"` });
      names.add(l.name);
    });
    (space.fc ?? DEFAULT_SPACE.fc).forEach((fc, i) => {
      const key = String(fc);
      if (req.prices.concrete[key] === undefined) {
        ctx.addIssue({ code: "custom", path: ["prices", "concrete", key], message: `no concrete price for f'c ${key} (space.fc[${i}])` });
      }
      if (req.carbon.concrete[key] === undefined) {
        ctx.addIssue({ code: "custom", path: ["carbon", "concrete", key], message: `no carbon factor for f'c ${key} (space.fc[${i}])` });
      }
    });
    const shapes = space.shapes ?? DEFAULT_SPACE.shapes;
    if ((space.confinement ?? []).includes("spiral") && !shapes.includes("circle")) {
      ctx.addIssue({ code: "custom", path: ["space", "confinement"], message: "spirals are searched for circles only: add \"circle\" to space.shapes" });
    }
    if (!req.member.braced && req.member.sway === undefined) {
      // allowed: the engine fails a slender sway column without stability data, with that reason
    }
  });

export type OptimizeRequest = z.infer<typeof optimizeRequestSchema>;

/** A contract error body: `{ error, issues: [{ path: "loads.0.Pu", message }] }`. */
export interface ValidationErrorBody {
  error: string;
  issues: Array<{ path: string; message: string }>;
}

/**
 * Parses an optimize request. Returns the typed request or the contract's error body.
 */
export function parseOptimizeRequest(input: unknown): { ok: true; value: OptimizeRequest } | { ok: false; error: ValidationErrorBody } {
  const r = optimizeRequestSchema.safeParse(input);
  if (r.success) return { ok: true, value: r.data };
  return {
    ok: false,
    error: {
      error: "invalid optimize request",
      issues: r.error.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message })),
    },
  };
}

/** Compile-time proof that parsed parts fit the engine's input types. */
export type _MemberFits = z.infer<typeof optimizeMemberSchema> extends Omit<MemberInput, "braceLevels"> ? true : never;
export type _LoadFits = z.infer<typeof loadCaseSchema> extends LoadCase ? true : never;
export type _PricesFit = z.infer<typeof pricesSchema> extends Prices ? true : never;
export type _CarbonFits = z.infer<typeof carbonSchema> extends CarbonFactors ? true : never;
