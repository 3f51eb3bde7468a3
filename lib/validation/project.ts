/**
 * A project's settings (product.md, flow step 2). Lengths are stored in inches whatever the
 * project's display units: SI is converted at the edges (forms, CSV, display) only.
 */
import { z } from "zod";

export const UNIT_SYSTEMS = ["US", "SI"] as const;
export const EXPOSURES = ["interior", "exposed", "earth"] as const;
export const EI_OPTIONS = ["a", "b", "c"] as const;

/** Minimum clear cover to ties by exposure, in (Table 20.5.1.3.1, from memory). */
export const MIN_COVER_BY_EXPOSURE: Record<(typeof EXPOSURES)[number], number> = { interior: 1.5, exposed: 2, earth: 3 };

const projectFields = {
  name: z.string().trim().min(1, "a project needs a name").max(120, "at most 120 characters"),
  codeBasis: z.literal("ACI 318-19", { error: "the code basis is ACI 318-19 (the only edition checked)" }),
  units: z.enum(UNIT_SYSTEMS, { error: 'units are "US" or "SI"' }),
  exposure: z.enum(EXPOSURES, { error: "exposure is interior, exposed or earth" }),
  /** clear cover to ties, in */
  cover: z.number({ error: "cover must be a number" }).min(0.75, "cover below 0.75 in is not buildable").max(6, "cover above 6 in is not a column cover"),
  eiOption: z.enum(EI_OPTIONS, { error: "EI option is a, b or c (6.6.4.4.4)" }),
  /** nominal maximum aggregate size, in */
  dagg: z.number({ error: "aggregate size must be a number" }).min(0.25, "aggregate below 1/4 in?").max(3, "aggregate above 3 in?"),
  notes: z.string().max(4000, "notes are limited to 4000 characters"),
};

export const projectCreateSchema = z
  .object({
    workspaceId: z.uuid({ error: "workspaceId must be a workspace id" }),
    name: projectFields.name,
    codeBasis: projectFields.codeBasis.default("ACI 318-19"),
    units: projectFields.units.default("US"),
    exposure: projectFields.exposure.default("interior"),
    cover: projectFields.cover.default(1.5),
    eiOption: projectFields.eiOption.default("b"),
    dagg: projectFields.dagg.default(0.75),
    notes: projectFields.notes.default(""),
  })
  .strict();

export const projectUpdateSchema = z
  .object({
    version: z.number().int().min(1, "version is the one you read"),
    name: projectFields.name.optional(),
    codeBasis: projectFields.codeBasis.optional(),
    units: projectFields.units.optional(),
    exposure: projectFields.exposure.optional(),
    cover: projectFields.cover.optional(),
    eiOption: projectFields.eiOption.optional(),
    dagg: projectFields.dagg.optional(),
    notes: projectFields.notes.optional(),
  })
  .strict();

export const projectListQuerySchema = z.object({ workspaceId: z.uuid({ error: "workspaceId must be a workspace id" }) });

export type ProjectCreate = z.infer<typeof projectCreateSchema>;
export type ProjectUpdate = z.infer<typeof projectUpdateSchema>;
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];
export type Exposure = (typeof EXPOSURES)[number];
