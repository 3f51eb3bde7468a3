/**
 * Project-wide standardization over stored search results: each mark's passing candidates from
 * its latest finished search, the price book's form-set cost, and the integer program of
 * optimizer/standardize. Marks with no finished search are named, so the page can run them first.
 */
import { readProjectSearchResults } from "@/db/queries/project-searches";
import { readMarkInputs } from "@/db/queries/search-inputs";
import { sweepOutlines, standardizeProject } from "@/optimizer/standardize";
import type { StandardizeCandidate, StandardizeInput, StandardizeMark } from "@/optimizer/standardize";
import { fingerprintMark } from "../search-request";

export interface StoredCandidate extends StandardizeCandidate {
  searchId: string;
  [field: string]: unknown;
}

export interface ProjectStandardizationInput {
  input: Omit<StandardizeInput<StoredCandidate>, "maxOutlines">;
  /** marks that have no finished search yet */
  missing: Array<{ markId: string; label: string; level: string }>;
  /** marks whose latest search ran with inputs that have changed since */
  stale: Array<{ markId: string; label: string; level: string }>;
}

export async function gatherStandardization(
  projectId: string,
  options: { oneFcPerLevel: boolean; rotatedShareForms: boolean },
  formSetCost: number,
): Promise<ProjectStandardizationInput> {
  const results = await readProjectSearchResults(projectId);
  const missing: ProjectStandardizationInput["missing"] = [];
  const stale: ProjectStandardizationInput["stale"] = [];
  const marks: StandardizeMark<StoredCandidate>[] = [];
  for (const { mark, search, candidates } of results) {
    const who = { markId: mark.id, label: mark.label, level: mark.level };
    if (!search) {
      missing.push(who);
      continue;
    }
    const inputs = await readMarkInputs(mark.id);
    if (inputs && fingerprintMark(inputs) !== search.inputsHash) stale.push(who);
    marks.push({
      id: mark.id,
      label: mark.label,
      level: mark.level,
      quantity: mark.quantity,
      candidates: candidates.map((c) => ({ ...(c.data as StandardizeCandidate), searchId: c.searchId })),
    });
  }
  return { input: { marks, formSetCost, ...options }, missing, stale };
}

export function sweepProject(gathered: ProjectStandardizationInput) {
  if (gathered.input.marks.length === 0) return [];
  return sweepOutlines(gathered.input);
}

export function solveProject(gathered: ProjectStandardizationInput, maxOutlines: number) {
  return standardizeProject({ ...gathered.input, maxOutlines });
}
