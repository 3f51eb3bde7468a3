/** `optimize FILE|-`: search alternatives and print the fronts (cli-contract.md § optimize). */
import { optimizeRequestSchema } from "../validation/optimize-request";
import type { OptimizeResult } from "../../optimizer/merge-results";
import { EXIT_FAIL, EXIT_OK, parseOrThrow, readJsonArgument, writeJson, type CliCommand } from "./run-command";

/** What the CLI prints: the contract's best, front and stats, plus the carbon front, the
 * reasons for rejected regions and the assumptions (the in-memory `passing` list and extra
 * counters stay out). */
export function printableResult(r: OptimizeResult) {
  return {
    best: r.best,
    front: r.front,
    carbonFront: r.carbonFront,
    stats: r.stats,
    rejected: r.rejected,
    assumptions: r.assumptions,
  };
}

export const command: CliCommand = {
  name: "optimize",
  usage: "optimize FILE|-   search alternatives, print the front",
  async run(args, io) {
    const req = parseOrThrow(optimizeRequestSchema, await readJsonArgument(args, io), "invalid optimize request");
    // the worker bundle is built on demand here (npm run build builds it for the app)
    // @ts-expect-error -- plain ESM build script without type declarations
    const { ensureWorkerBundle } = (await import("../../scripts/build-workers.mjs")) as { ensureWorkerBundle: () => Promise<string> };
    await ensureWorkerBundle();
    const { runSearchOnPool, closeOptimizerPools } = await import("../../optimizer/optimizer-pool");
    try {
      const result = await runSearchOnPool(req);
      writeJson(io, printableResult(result));
      return result.best !== null ? EXIT_OK : EXIT_FAIL;
    } finally {
      await closeOptimizerPools();
    }
  },
};
