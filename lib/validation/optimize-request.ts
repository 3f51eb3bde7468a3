/**
 * The `optimize` request (cli-contract.md § optimize): one column's member data, load cases,
 * price book, carbon factors and the candidate space to search. Shared by the CLI, the API
 * route, the pg-boss job and the worker threads.
 *
 * Defaults (the documented default space, used when `space` or a field of it is absent):
 * rectangles b, h 12–36 in step 2 and circles D 12–36 in step 2, f'c 4/5/6/8 ksi, fy 60 ksi,
 * bars #6–#11, 0–2 brace levels (0 only for a sway column), cover 1.5 in, ρmax 0.04 (common practice, so lap splices
 * fit), dagg 0.75 in, tied confinement. SI requests default to 300–900 mm step 50, f'c
 * 28/35/42/55 MPa, fy 420 MPa, A615M bars 19–36, cover 40 mm, dagg 20 mm.
 */
import { z } from "zod";
import type { BarSize } from "../../engine/types";

import { barSizeSchema, positive, unitsSchema } from "./common";
import { loadCaseSchema } from "./load-case";
import { memberSchema } from "./member";
import { pricesSchema } from "./prices";
import { carbonSchema } from "./carbon";

export { loadCaseSchema, pricesSchema, carbonSchema };

const range = (what: string) =>
  z
    .tuple([positive(`${what} low`), positive(`${what} high`), positive(`${what} step`)], {
      error: `${what} is an inclusive range [low, high, step]`,
    })
    .superRefine(([lo, hi, step], ctx) => {
      if (hi < lo) ctx.addIssue({ code: "custom", message: `${what}: high (${hi}) is below low (${lo})` });
      else if ((hi - lo) / step > 200) ctx.addIssue({ code: "custom", message: `${what}: more than 200 values; widen the step` });
    });


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

/** The default space of an SI request: mm, MPa, A615M bars (grade 420 ≈ 60 ksi). */
export const DEFAULT_SPACE_SI: typeof DEFAULT_SPACE = {
  shapes: ["rect", "circle"],
  b: [300, 900, 50],
  h: [300, 900, 50],
  D: [300, 900, 50],
  fc: [28, 35, 42, 55],
  fy: [420],
  sizes: ["19", "22", "25", "29", "32", "36"],
  braceLevels: [0, 1, 2],
  cover: 40,
  rhoMax: 0.04,
  dagg: 20,
  confinement: ["tied"],
};

/** The defaults for a request's units. */
export function defaultSpaceFor(units: "US" | "SI" | undefined): typeof DEFAULT_SPACE {
  return units === "SI" ? DEFAULT_SPACE_SI : DEFAULT_SPACE;
}

export const spaceSchema = z
  .object({
    shapes: z.array(z.enum(["rect", "circle"])).min(1, "at least one shape").optional(),
    b: range("b").optional(),
    h: range("h").optional(),
    D: range("D").optional(),
    fc: z.array(positive("f'c")).min(1).max(12).optional(),
    fy: z.array(positive("fy")).min(1).max(6).optional(),
    sizes: z.array(barSizeSchema).min(1).max(11).optional(),
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
    units: unitsSchema.optional(),
    member: memberSchema,
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
    const defaults = defaultSpaceFor(req.units);
    const fyLimit = si ? 551.6 : 80;
    (space.fy ?? defaults.fy).forEach((fy, i) => {
      if (fy > fyLimit) {
        ctx.addIssue({ code: "custom", path: ["space", "fy", i], message: `fy above ${si ? "551.6 MPa" : "80 ksi"} is not allowed for longitudinal bars (Table 20.2.2.4(a))` });
      }
    });
    const names = new Set<string>();
    req.loads.forEach((l, i) => {
      if (names.has(l.name)) ctx.addIssue({ code: "custom", path: ["loads", i, "name"], message: `duplicate load case name "${l.name}"` });
      names.add(l.name);
    });
    (space.fc ?? defaults.fc).forEach((fc, i) => {
      const key = String(fc);
      const has = (table: Record<string, number>) => Object.keys(table).some((k) => Math.abs(Number(k) - fc) <= 1e-6 * Math.max(1, fc));
      if (!has(req.prices.concrete)) {
        ctx.addIssue({ code: "custom", path: ["prices", "concrete", key], message: `no concrete price for f'c ${key} (space.fc[${i}])` });
      }
      if (!has(req.carbon.concrete)) {
        ctx.addIssue({ code: "custom", path: ["carbon", "concrete", key], message: `no carbon factor for f'c ${key} (space.fc[${i}])` });
      }
    });
    const shapes = space.shapes ?? defaults.shapes;
    if ((space.confinement ?? []).includes("spiral") && !shapes.includes("circle")) {
      ctx.addIssue({ code: "custom", path: ["space", "confinement"], message: "spirals are searched for circles only: add \"circle\" to space.shapes" });
    }
    if (req.member.braceLevels !== undefined) {
      ctx.addIssue({ code: "custom", path: ["member", "braceLevels"], message: "brace levels are searched: give them as space.braceLevels" });
    }
    if (!req.member.braced && (space.braceLevels ?? [0]).some((n) => n > 0)) {
      ctx.addIssue({ code: "custom", path: ["space", "braceLevels"], message: "intermediate brace levels are checked for braced columns only: use space.braceLevels [0] for a sway column (column-checks.md §7.8)" });
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

