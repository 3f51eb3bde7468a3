/**
 * The `check` request (cli-contract.md § check): section, member, options, load cases and
 * optional prices / carbon factors, in US units or SI (`"units": "SI"`). Shared by the CLI
 * and the API route.
 */
import { z } from "zod";
import { MPA_PER_KSI } from "../../engine/units";
import { carbonSchema } from "./carbon";
import { unitsSchema, positive } from "./common";
import { loadCaseSchema } from "./load-case";
import { memberSchema } from "./member";
import { pricesSchema } from "./prices";
import { sectionSchema } from "./section";

export const checkOptionsSchema = z
  .object({
    ei: z.enum(["a", "b", "c"], { error: 'ei must be "a", "b" or "c" (6.6.4.4.4)' }).optional(),
    dagg: positive("dagg").optional(),
    rhoMax: z.number().min(0.01, "rhoMax must be at least the 0.01 minimum (10.6.1.1)").max(0.08, "rhoMax cannot exceed 0.08 (10.6.1.1)").optional(),
    exposure: z.enum(["interior", "exposed", "earth"], { error: 'exposure must be "interior", "exposed" or "earth"' }).optional(),
    radius: z.enum(["approx", "gross"], { error: 'radius must be "approx" or "gross"' }).optional(),
    bresler: z.boolean().optional(),
  })
  .strict();

/** Strength limits checked in the request's own units. */
export function addStrengthIssues(
  section: { fc: number; fy: number },
  si: boolean,
  ctx: z.RefinementCtx,
  path: (string | number)[] = ["section"],
): void {
  const fyKsi = si ? section.fy / MPA_PER_KSI : section.fy;
  const fcKsi = si ? section.fc / MPA_PER_KSI : section.fc;
  if (fyKsi > 80 + 1e-9) {
    ctx.addIssue({
      code: "custom",
      path: [...path, "fy"],
      message: `fy above ${si ? "551.6 MPa" : "80 ksi"} is not allowed for longitudinal bars (Table 20.2.2.4(a))`,
    });
  }
  if (fcKsi < 2.5 - 1e-9) {
    ctx.addIssue({ code: "custom", path: [...path, "fc"], message: `fc below ${si ? "17.2 MPa" : "2.5 ksi"} is not allowed (Table 19.2.1.1)` });
  }
}

function hasStrengthKey(table: Record<string, number>, fc: number): boolean {
  return Object.keys(table).some((k) => Math.abs(Number(k) - fc) <= 1e-5 * Math.max(1, fc));
}

export const checkRequestSchema = z
  .object({
    units: unitsSchema.optional(),
    section: sectionSchema,
    member: memberSchema,
    options: checkOptionsSchema.optional(),
    loads: z.array(loadCaseSchema).min(1, "at least one load case").max(200, "at most 200 load cases"),
    prices: pricesSchema.optional(),
    carbon: carbonSchema.optional(),
  })
  .strict()
  .superRefine((req, ctx) => {
    const si = req.units === "SI";
    addStrengthIssues(req.section, si, ctx);
    const names = new Set<string>();
    req.loads.forEach((l, i) => {
      if (names.has(l.name)) ctx.addIssue({ code: "custom", path: ["loads", i, "name"], message: `duplicate load case name "${l.name}"` });
      names.add(l.name);
    });
    if (req.prices !== undefined && !hasStrengthKey(req.prices.concrete, req.section.fc)) {
      ctx.addIssue({ code: "custom", path: ["prices", "concrete"], message: `no concrete price for f'c ${req.section.fc}` });
    }
    if (req.carbon !== undefined && !hasStrengthKey(req.carbon.concrete, req.section.fc)) {
      ctx.addIssue({ code: "custom", path: ["carbon", "concrete"], message: `no carbon factor for f'c ${req.section.fc}` });
    }
  });

export type CheckRequest = z.infer<typeof checkRequestSchema>;
