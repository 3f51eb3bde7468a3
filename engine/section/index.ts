export { resolveSection } from "./resolve-section";
export { rotateSection } from "./rotate-section";
export { measureCircularSegment } from "./measure-circular-segment";
export { clipRectangleBlock } from "./clip-rectangle-block";
