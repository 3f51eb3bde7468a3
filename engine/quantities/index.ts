export { computeQuantities } from "./compute-quantities";
export type { QuantityDetail } from "./compute-quantities";
export { computeCost, lookupByStrength } from "./compute-cost";
export { computeCarbon } from "./compute-carbon";
export { computeLapLength } from "./compute-lap-length";
export { computeHookExtension } from "./compute-hook-extension";
export { computeTieCount } from "./compute-tie-count";
