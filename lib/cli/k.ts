/** `k --psi-a A --psi-b B [--sway]`: effective length factor from the alignment-chart equations. */
import { solveEffectiveLength } from "../../engine/effective-length";
import { kRequestSchema } from "../validation/k-request";
import { EXIT_OK, InputError, parseOrThrow, writeJson, type CliCommand } from "./run-command";

/** Parse `--psi-a 1 --psi-b 2.5 --sway` (also `--psi-a=1`). */
export function parseKArgs(args: string[]): { psiA?: unknown; psiB?: unknown; sway: boolean } {
  const out: { psiA?: unknown; psiB?: unknown; sway: boolean } = { sway: false };
  for (let i = 0; i < args.length; i++) {
    const a = args[i] as string;
    const [flag, inline] = a.includes("=") ? [a.slice(0, a.indexOf("=")), a.slice(a.indexOf("=") + 1)] : [a, undefined];
    if (flag === "--sway") {
      out.sway = true;
      continue;
    }
    if (flag === "--psi-a" || flag === "--psi-b") {
      const raw = inline ?? args[++i];
      const v = raw === undefined || raw.trim() === "" ? undefined : Number(raw);
      if (flag === "--psi-a") out.psiA = v;
      else out.psiB = v;
      continue;
    }
    throw new InputError({ error: "invalid k request", issues: [{ path: "", message: `unknown argument ${a}` }] });
  }
  return out;
}

export const command: CliCommand = {
  name: "k",
  usage: "k --psi-a A --psi-b B [--sway]   effective length factor (alignment chart, R6.2.5)",
  async run(args, io) {
    const req = parseOrThrow(kRequestSchema, parseKArgs(args), "invalid k request");
    const k = solveEffectiveLength(req.psiA, req.psiB, req.sway);
    writeJson(io, {
      k,
      psiA: req.psiA,
      psiB: req.psiB,
      sway: req.sway,
      source: req.sway ? "sway alignment-chart equation, commentary R6.2.5" : "braced alignment-chart equation, commentary R6.2.5",
    });
    return EXIT_OK;
  },
};
