// Builds the worker bundles that run outside Next.js's bundler (stack-notes.md, worker threads):
// optimizer/worker-entry.ts → dist/workers/optimizer-worker.mjs (ESM, node20, everything inlined).
// `node scripts/build-workers.mjs` builds; importing `ensureWorkerBundle` rebuilds only when a
// source file is newer than the bundle (CLI, benchmarks, tests).
import { build } from "esbuild";
import { existsSync, readdirSync, renameSync, statSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
export const WORKER_OUT = path.join(root, "dist", "workers", "optimizer-worker.mjs");
const SOURCES = ["engine", "optimizer", "lib/validation"];

export async function buildWorkers() {
  // write beside the bundle and rename: a process starting a pool never reads half a file
  const tmp = `${WORKER_OUT}.${process.pid}.tmp`;
  await build({
    entryPoints: [path.join(root, "optimizer", "worker-entry.ts")],
    outfile: tmp,
    bundle: true,
    platform: "node",
    format: "esm",
    target: "node20",
    sourcemap: false,
    logLevel: "warning",
    alias: { "@": root },
  });
  renameSync(tmp, WORKER_OUT);
  return WORKER_OUT;
}

function newestSource(dir) {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const p = path.join(dir, entry.name);
    if (entry.isDirectory()) newest = Math.max(newest, newestSource(p));
    else if (entry.name.endsWith(".ts")) newest = Math.max(newest, statSync(p).mtimeMs);
  }
  return newest;
}

/** Builds the bundle when it is missing or older than any engine / optimizer / validation source. */
export async function ensureWorkerBundle() {
  const newest = Math.max(...SOURCES.map((d) => newestSource(path.join(root, d))));
  if (!existsSync(WORKER_OUT) || statSync(WORKER_OUT).mtimeMs < newest) await buildWorkers();
  return WORKER_OUT;
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) {
  const out = await buildWorkers();
  console.log(`built ${path.relative(root, out)}`);
}
