// The search worker process (`npm run worker`; started by `npm start`). Takes search jobs from the
// pg-boss queue in PostgreSQL and runs them on piscina threads. Start as many as you like, on as
// many machines as you like, all pointed at the same DATABASE_URL: they share the queue.
import { getBoss, stopBoss, SEARCH_QUEUE, type SearchJobData } from "../lib/jobs/search-queue";
import { processSearchJob } from "../lib/jobs/process-search-job";
import { runSearchJob, InvalidSearchRequest, closeSearchPool } from "../lib/jobs/optimizer-runner";
import { failSearch } from "../db/queries/searches";
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
  log(`listening on queue ${SEARCH_QUEUE}`);
}

let stopping = false;
async function shutdown(): Promise<void> {
  if (stopping) return;
  stopping = true;
  log("stopping");
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
