/**
 * Standardization benchmark: an invented 30-mark project with 40 outlines per mark (two
 * candidates per outline, 80 per mark before the per-outline reduction). Prints the wall time of
 * one solve for several N and form-set costs, for the default path ("auto": bounds, outline
 * fixing, reduced integer program), for the whole integer program with no reductions, and for
 * the exact branch and bound alone; then the time of a full sweep N = 1 … 30.
 * Run: npm run bench:standardize
 */
import { standardizeProject, sweepOutlines, type StandardizeResult } from "../optimizer/standardize";
import { inventProject } from "../optimizer/standardize/invent-project";

const MARKS = 30;
const OUTLINES = 40;
const SEEDS = [1, 2, 3];
const NS = [1, 2, 3, 5, 8, 12, 30];
const FORM_SETS = [0, 1500, 20000];

function timeIt<T>(fn: () => T): { value: T; ms: number } {
  const t0 = performance.now();
  const value = fn();
  return { value, ms: performance.now() - t0 };
}

function describe(r: StandardizeResult): string {
  if (!r.feasible) return `infeasible (needs ${r.minOutlines ?? "?"})`;
  return `${(r.totalCost ?? 0).toFixed(2)} with ${r.outlines.length} outlines [${r.stats.method}, ${r.stats.outlinesInModel} in model]`;
}

// warm-up (JIT) on a small project
standardizeProject({ ...inventProject({ seed: 99, marks: 8, outlinesPerMark: 10 }), maxOutlines: 3 });

console.log(`standardization, ${MARKS} marks × ${OUTLINES} outlines per mark (invented data)`);
let worstAuto = 0;
let worstIp = 0;
let worstBb = 0;
let worstSweep = 0;
for (const seed of SEEDS) {
  for (const formSetCost of FORM_SETS) {
    const base = inventProject({ seed, marks: MARKS, outlinesPerMark: OUTLINES, formSetCost });
    const outlines = new Set(base.marks.flatMap((m) => m.candidates.map((c) => (c.shape === "circle" ? `c${c.D}` : `r${Math.min(c.b ?? 0, c.h ?? 0)}x${Math.max(c.b ?? 0, c.h ?? 0)}`)))).size;
    console.log(`\nseed ${seed}, form set ${formSetCost}, ${outlines} distinct outlines in the project`);
    for (const N of NS) {
      const input = { ...base, maxOutlines: N };
      const auto = timeIt(() => standardizeProject(input));
      const ip = timeIt(() => standardizeProject(input, { method: "integer-program" }));
      const bb = timeIt(() => standardizeProject(input, { method: "branch-and-bound" }));
      worstAuto = Math.max(worstAuto, auto.ms);
      worstIp = Math.max(worstIp, ip.ms);
      worstBb = Math.max(worstBb, bb.ms);
      const agree = auto.value.totalCost === ip.value.totalCost && auto.value.totalCost === bb.value.totalCost ? "" : "  ** totals differ **";
      console.log(
        `  N=${String(N).padStart(2)}  auto ${auto.ms.toFixed(0).padStart(5)} ms  whole IP ${ip.ms.toFixed(0).padStart(5)} ms  B&B ${bb.ms.toFixed(0).padStart(4)} ms  ${describe(auto.value)}${agree}`,
      );
    }
    const sweep = timeIt(() => sweepOutlines(base));
    worstSweep = Math.max(worstSweep, sweep.ms);
    console.log(`  sweep N = 1 … ${MARKS}: ${sweep.ms.toFixed(0)} ms`);
  }
}
console.log(
  `\nslowest single solve: auto ${worstAuto.toFixed(0)} ms, whole integer program ${worstIp.toFixed(0)} ms, branch and bound ${worstBb.toFixed(0)} ms; slowest sweep ${worstSweep.toFixed(0)} ms`,
);
