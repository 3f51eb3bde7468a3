/**
 * Public surface of the optimizer (see optimizer/README.md).
 *
 * In process:  runSearchInProcess(request, { onProgress, signal, parts, exhaustive })
 * Thread pool: runSearchOnPool(request, { threads, onProgress, signal, pool, exhaustive })
 * Job queue:   poolSearchRunner(pool?) → the SearchRunner lib/jobs/process-search-job.ts takes
 */
export { runSearchInProcess, validateRequest, OptimizeInputError, SearchCancelledError } from "./run-search";
export type { SearchOptions, SearchProgress } from "./run-search";
export { runSearchOnPool, getOptimizerPool, closeOptimizerPools, poolSearchRunner, WORKER_BUNDLE } from "./optimizer-pool";
export type { PoolOptions, PoolSearchOptions } from "./optimizer-pool";
export type { OptimizeResult, OptimizeStats } from "./merge-results";
export type { FrontEntry } from "./front-entry";
export type { PassingSummary, SearchTask, TaskResult } from "./run-task";
export { runSearchTask } from "./run-task";
export { formatCandidateId, parseCandidateId, countPerimeterBars } from "./candidate-id";
export { selectFront, dominates, Staircase, toCents, toUtilUnits, toCarbonUnits } from "./pareto-front";
