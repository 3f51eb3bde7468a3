export { solveBracedK } from "./solve-braced-k";
export { solveSwayK } from "./solve-sway-k";
export { solveEffectiveLength } from "./solve-effective-length";
export { computePsi, PSI_FIXED, PSI_PINNED } from "./compute-psi";
export type { FramingMember } from "./compute-psi";
