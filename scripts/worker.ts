// The search worker process (`npm run worker`; started by `npm start`). Takes search jobs from the
// pg-boss queue in PostgreSQL and runs them on piscina threads. Start as many as you like, on as
// many machines as you like, all pointed at the same DATABASE_URL: they share the queue.
import { getBoss, stopBoss, reapSilentSearchJobs, SEARCH_QUEUE, type SearchJobData } from "../lib/jobs/search-queue";
import { processSearchJob } from "../lib/jobs/process-search-job";
import { runSearchJob, InvalidSearchRequest, closeSearchPool } from "../lib/jobs/optimizer-runner";
import { failSearch, reapSilentSearches } from "../db/queries/searches";
import { closeDb } from "../db/client";

const workerName = process.env.WORKER_NAME ?? `worker-${process.pid}`;

function log(message: string): void {
  console.log(`[${new Date().toISOString()}] ${workerName} ${message}`);
}

async function main(): Promise<void> {
  const boss = await getBoss();
  await boss.work<SearchJobData>(
    SEARCH_QUEUE,
    { includeMetadata: true, batchSize: 1, pollingIntervalSeconds: Number(process.env.SEARCH_POLL_SECONDS ?? 0.5) },
    async (jobs) => {
      for (const job of jobs) {
        const { searchId } = job.data;
        log(`took search ${searchId} (attempt ${job.retryCount + 1})`);
        try {
          const result = await processSearchJob(searchId, runSearchJob);
          log(`search ${searchId}: ${result}`);
        } catch (error) {
          const message = error instanceof Error ? error.message : String(error);
          if (error instanceof InvalidSearchRequest || job.retryCount >= job.retryLimit) {
            await failSearch(searchId, message);
            log(`search ${searchId} failed: ${message}`);
            return;
          }
          log(`search ${searchId} attempt failed, will retry: ${message}`);
          throw error;
        }
      }
    },
  );
  // Every worker also watches for searches whose worker died, so one survivor is enough.
  reaper = setInterval(() => {
    reapSilentSearchJobs(reapSilentSearches)
      .then((ids) => ids.forEach((id) => log(`search ${id} lost its worker: handed back to the queue`)))
      .catch((error: unknown) => log(`reaper: ${error instanceof Error ? error.message : String(error)}`));
  }, 2000);
  log(`listening on queue ${SEARCH_QUEUE}`);
}

let reaper: ReturnType<typeof setInterval> | undefined;

let stopping = false;
async function shutdown(): Promise<void> {
  if (stopping) return;
  stopping = true;
  log("stopping");
  if (reaper) clearInterval(reaper);
  await stopBoss().catch(() => undefined);
  await closeSearchPool().catch(() => undefined);
  await closeDb().catch(() => undefined);
  process.exit(0);
}
process.on("SIGINT", () => void shutdown());
process.on("SIGTERM", () => void shutdown());

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
