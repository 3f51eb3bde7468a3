/**
 * Piscina worker entry: takes one task message and runs the pure task function. Compiled to
 * dist/workers/optimizer-worker.mjs by scripts/build-workers.mjs.
 */
import { runSearchTask, type SearchTask, type TaskResult } from "./run-task";

function isTask(m: unknown): m is SearchTask {
  if (m === null || typeof m !== "object") return false;
  const t = m as Record<string, unknown>;
  const shared = t.shared as { buffer?: unknown } | undefined;
  return (
    Number.isInteger(t.part) &&
    Number.isInteger(t.parts) &&
    typeof t.exhaustive === "boolean" &&
    shared !== undefined &&
    shared.buffer instanceof SharedArrayBuffer
  );
}

export default function handleTask(message: unknown): TaskResult {
  if (!isTask(message)) throw new TypeError("optimizer worker: malformed task message");
  return runSearchTask(message);
}
