/**
 * Turns a search candidate (its contract id) back into a design a mark can carry: the section in
 * the check contract's shape plus the brace levels. The id holds every design choice, so the
 * conversion never depends on which optional fields a stored candidate happens to carry.
 */
import { parseCandidateId } from "@/optimizer/candidate-id";
import type { SectionInput } from "@/engine/types";
import { unprocessable } from "./api/errors";

export interface MarkDesign {
  section: SectionInput;
  braceLevels: number;
}

export function designFromCandidateId(candidateId: string, cover: number): MarkDesign {
  const parts = parseCandidateId(candidateId);
  if (!parts) throw unprocessable("not a candidate id", [{ path: "candidateId", message: `"${candidateId}" is not a candidate id` }]);
  if (parts.shape === "rect") {
    return {
      section: {
        shape: "rect",
        b: parts.b,
        h: parts.h,
        fc: parts.fc,
        fy: parts.fy,
        confinement: "tied",
        cover,
        layout: { type: "perimeter", size: parts.size, nb: parts.nb, nh: parts.nh },
      },
      braceLevels: parts.braceLevels,
    };
  }
  return {
    section: {
      shape: "circle",
      D: parts.D,
      fc: parts.fc,
      fy: parts.fy,
      confinement: parts.confinement,
      cover,
      layout: { type: "circle", size: parts.size, n: parts.n },
    },
    braceLevels: parts.braceLevels,
  };
}
