/**
 * The search candidate id a stored design corresponds to (cli-contract.md ids), or null when the
 * design uses a layout no search produces (explicit bars, faces layout). Lets the schedule say
 * whether the approved alternative is still the design the mark carries.
 */
import { formatCandidateId } from "@/optimizer/candidate-id";
import type { StoredDesign } from "./check-stored-design";

export function designCandidateId(design: StoredDesign): string | null {
  const s = design.section;
  const layout = s.layout;
  if (!layout) return null;
  if (s.shape === "rect" && layout.type === "perimeter" && s.b !== undefined && s.h !== undefined && s.confinement === "tied") {
    return formatCandidateId({ shape: "rect", b: s.b, h: s.h, fc: s.fc, fy: s.fy, size: layout.size, nb: layout.nb, nh: layout.nh, braceLevels: design.braceLevels });
  }
  if (s.shape === "circle" && layout.type === "circle" && s.D !== undefined) {
    return formatCandidateId({ shape: "circle", D: s.D, fc: s.fc, fy: s.fy, size: layout.size, n: layout.n, confinement: s.confinement, braceLevels: design.braceLevels });
  }
  return null;
}
