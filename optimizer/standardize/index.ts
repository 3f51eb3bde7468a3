/** Project-wide standardization of column outlines (public surface). */
export { standardizeProject, type StandardizeSolveOptions } from "./standardize-project";
export { sweepOutlines } from "./sweep-outlines";
export { formatOutlineKey, type OutlineParts } from "./outline-key";
export { buildIntegerProgram } from "./solve-integer-program";
export type * from "./types";
