export { checkDetailing } from "./check-detailing";
export { checkSteelRatio } from "./check-steel-ratio";
export { checkBarCount } from "./check-bar-count";
export { checkClearSpacing, computeMinClearSpacing } from "./check-clear-spacing";
export { checkCover, minimumCover } from "./check-cover";
export { checkTies, maxTieSpacing, findBarExtremes } from "./check-ties";
export { checkSpiral, computeSpiralRatio } from "./check-spiral";
export { countCrossTies, checkLateralSupport } from "./count-cross-ties";
export type { CrossTieCount } from "./count-cross-ties";
