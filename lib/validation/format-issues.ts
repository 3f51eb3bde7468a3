import type { z } from "zod";

/** The contract's error body: `{ error, issues: [{ path: "loads.0.Pu", message }] }`. */
export interface ValidationErrorBody {
  error: string;
  issues: Array<{ path: string; message: string }>;
}

/**
 * Turn a zod error into the contract's error body; paths are dotted ("loads.0.Mx.M1").
 * @example formatIssues(schema.safeParse(x).error, "invalid check request")
 */
export function formatIssues(error: z.ZodError, summary: string): ValidationErrorBody {
  return {
    error: summary,
    issues: error.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message })),
  };
}
