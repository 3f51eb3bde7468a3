/**
 * `standardize FILE|-`: at most N distinct outlines for the whole project, one passing candidate
 * per mark on them, least total cost (README § standardize). Exit 0 when an assignment exists
 * (with `"sweep": true`: for at least one N), 1 when none does, 2 on invalid input.
 */
import { standardizeProject, sweepOutlines, type StandardizeInput, type StandardizeResult } from "../../optimizer/standardize";
import { standardizeRequestSchema, type StandardizeRequest } from "../validation/standardize-request";
import { EXIT_FAIL, EXIT_OK, parseOrThrow, readJsonArgument, writeJson, type CliCommand } from "./run-command";

type Candidate = StandardizeRequest["marks"][number]["candidates"][number];

export type StandardizeOutput = StandardizeResult<Candidate> | { sweep: StandardizeResult<Candidate>[] };

function toInput(req: StandardizeRequest): StandardizeInput<Candidate> {
  return {
    marks: req.marks.map((m) => {
      const mark: StandardizeInput<Candidate>["marks"][number] = { id: m.id, label: m.label ?? m.id, quantity: m.quantity, candidates: m.candidates };
      if (m.level !== undefined) mark.level = String(m.level);
      return mark;
    }),
    maxOutlines: req.maxOutlines ?? req.marks.length,
    formSetCost: req.formSetCost,
    oneFcPerLevel: req.oneFcPerLevel ?? false,
    rotatedShareForms: req.rotatedShareForms ?? true,
  };
}

/** Validate and solve; returns the output and whether an assignment exists. */
export function runStandardizeRequest(value: unknown): { output: StandardizeOutput; feasible: boolean } {
  const req = parseOrThrow(standardizeRequestSchema, value, "invalid standardize request");
  const input = toInput(req);
  if (req.sweep === true) {
    const sweep = sweepOutlines(input);
    return { output: { sweep }, feasible: sweep.some((r) => r.feasible) };
  }
  const result = standardizeProject(input);
  return { output: result, feasible: result.feasible };
}

export const command: CliCommand = {
  name: "standardize",
  usage: "standardize FILE|-  fewest distinct column outlines for form reuse (integer program)",
  async run(args, io) {
    const { output, feasible } = runStandardizeRequest(await readJsonArgument(args, io));
    writeJson(io, output);
    return feasible ? EXIT_OK : EXIT_FAIL;
  },
};
