/**
 * A load combination of a column mark: the contract's load case (name, Pu, βdns, Mx and My end
 * moments as magnitudes with curvature, sway parts) stored in kip and kip-in, plus its position
 * in the mark's table. The load case shape is the contract's schema, reused.
 */
import { z } from "zod";
import { loadCaseSchema } from "./load-case";

export { loadCaseSchema };

export const loadCombinationCreateSchema = loadCaseSchema.extend({
  position: z.number().int().min(0).optional(),
});

export const loadCombinationUpdateSchema = loadCaseSchema.partial().extend({
  version: z.number().int().min(1, "version is the one you read"),
  position: z.number().int().min(0).optional(),
});

export type LoadCombinationCreate = z.infer<typeof loadCombinationCreateSchema>;
export type LoadCombinationUpdate = z.infer<typeof loadCombinationUpdateSchema>;

/** Sway parts (M1s, M2s) are meaningful only for a sway column (6.6.4.6). */
export function swayPartIssues(load: { Mx?: { M1s?: number; M2s?: number }; My?: { M1s?: number; M2s?: number } }, braced: boolean) {
  if (!braced) return [];
  const issues: Array<{ path: string; message: string }> = [];
  for (const axis of ["Mx", "My"] as const) {
    const m = load[axis];
    if (!m) continue;
    for (const part of ["M1s", "M2s"] as const) {
      if (m[part] !== undefined && m[part] !== 0) {
        issues.push({ path: `${axis}.${part}`, message: `${part} is a sway part: this mark is braced (set it to sway first)` });
      }
    }
  }
  return issues;
}
