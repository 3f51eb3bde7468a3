export { phiFactor } from "./phi-factor";
export { sectionForcesAt, type SectionForces } from "./section-forces-at";
export { interactionDiagram } from "./interaction-diagram";
export { phiMnAt } from "./phi-mn-at";
export { phiMnAtAngle, type BiaxialCapacity } from "./phi-mn-at-angle";
export { circleCapacityAt } from "./circle-capacity-at";
export { breslerReciprocal, type BreslerResult } from "./bresler-reciprocal";
