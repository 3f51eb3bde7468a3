/**
 * The search worker's bridge to the optimizer: runs the stored request on the piscina pool and
 * shapes the result for storage. Passing candidates that are not on a front carry only their id
 * and objectives, so their design fields (read back from the contract id) and steel ratio are
 * added here for the candidate table's filters.
 */
import { runSearchOnPool, closeOptimizerPools } from "@/optimizer/optimizer-pool";
import { OptimizeInputError } from "@/optimizer/run-search";
import { parseCandidateId } from "@/optimizer/candidate-id";
import { barProperties } from "@/engine/rebar";
import type { SearchOutcome, SearchEntry, SearchRunner } from "./process-search-job";

export class InvalidSearchRequest extends Error {
  constructor(message: string) {
    super(message);
    this.name = "InvalidSearchRequest";
  }
}

/** Design fields of a candidate from its id; the steel ratio from its bars and outline. */
export function describeCandidate(entry: { id: string; shape: string; cost: number; carbon: number; utilization: number }): SearchEntry & Record<string, unknown> {
  const parts = parseCandidateId(entry.id);
  if (!parts) return entry;
  const area = barProperties(parts.size).area;
  if (parts.shape === "rect") {
    const count = 2 * parts.nb + 2 * (parts.nh - 2);
    return {
      ...entry,
      b: parts.b,
      h: parts.h,
      fc: parts.fc,
      fy: parts.fy,
      confinement: "tied",
      bars: { size: parts.size, count, layout: { type: "perimeter", nb: parts.nb, nh: parts.nh } },
      braceLevels: parts.braceLevels,
      rho: Math.round(((count * area) / (parts.b * parts.h)) * 1e5) / 1e5,
    };
  }
  return {
    ...entry,
    D: parts.D,
    fc: parts.fc,
    fy: parts.fy,
    confinement: parts.confinement,
    bars: { size: parts.size, count: parts.n, layout: { type: "circle", n: parts.n } },
    braceLevels: parts.braceLevels,
    rho: Math.round(((parts.n * area) / ((Math.PI * parts.D * parts.D) / 4)) * 1e5) / 1e5,
  };
}

export const runSearchJob: SearchRunner = async (request, options) => {
  try {
    const result = await runSearchOnPool(request, {
      onProgress: options.onProgress,
      signal: options.signal,
      threads: Number(process.env.SEARCH_THREADS ?? 0) || undefined,
    });
    const frontIds = new Set(result.front.map((e) => e.id));
    const outcome: SearchOutcome = {
      front: result.front,
      passing: result.passing.filter((p) => !frontIds.has(p.id)).map((p) =>
        describeCandidate({ id: p.id, shape: p.shape, cost: p.cost, carbon: p.carbon, utilization: p.utilization }),
      ),
      stats: {
        ...result.stats,
        best: result.best?.id ?? null,
        carbonFront: result.carbonFront.map((e) => e.id),
        rejected: result.rejected,
        assumptions: result.assumptions,
      },
    };
    return outcome;
  } catch (error) {
    if (error instanceof OptimizeInputError) {
      throw new InvalidSearchRequest(`${error.body.error}: ${error.body.issues.map((i) => `${i.path} ${i.message}`).join("; ")}`);
    }
    throw error;
  }
};

export async function closeSearchPool(): Promise<void> {
  await closeOptimizerPools();
}
