export { prepareMember } from "./prepare-member";
export type { PreparedMember, SwayAxisState } from "./prepare-member";
export { checkResolved, CAUTION, CODE_EDITION } from "./check-resolved";
export type { CheckExtras } from "./check-resolved";
export { caseUtilization, governingUtilization } from "./case-utilization";
export { evaluateCase, createCaseScratch } from "./evaluate-case";
export type { CaseScratch, Failure, Variant } from "./evaluate-case";
export { formatForce, formatMoment } from "./format-value";
