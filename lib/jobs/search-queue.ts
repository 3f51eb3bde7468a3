/**
 * The search queue on pg-boss, in the same PostgreSQL as everything else: any number of worker
 * processes on any number of machines pointed at that database share the queue with no code change.
 * A running search beats a heartbeat into its row; when a worker dies, another worker's reaper sees
 * the silence (SEARCH_SILENT_SECONDS) and fails the job in pg-boss, which hands it to the next
 * worker (retryLimit) to re-run from the stored request. Job expiry is only a last resort: pg-boss
 * also ends a handler that runs longer than it, so it is set far above any search's duration.
 */
import PgBoss from "pg-boss";
import { databaseUrl } from "@/db/client";

export const SEARCH_QUEUE = "column-search";

export interface SearchJobData {
  searchId: string;
}

interface BossGlobal {
  caryatidBoss?: Promise<PgBoss>;
}
const store = globalThis as typeof globalThis & BossGlobal;

function expireSeconds(): number {
  return Number(process.env.SEARCH_JOB_EXPIRE_SECONDS ?? 3600);
}

export function silentSeconds(): number {
  return Number(process.env.SEARCH_SILENT_SECONDS ?? 15);
}

async function startBoss(): Promise<PgBoss> {
  const boss = new PgBoss({
    connectionString: databaseUrl(),
    schema: "pgboss",
    max: 4,
    // How often expired (orphaned) jobs are found and retried.
    maintenanceIntervalSeconds: Number(process.env.SEARCH_MAINTENANCE_SECONDS ?? 30),
  });
  boss.on("error", (error) => console.error("[queue]", error.message));
  await boss.start();
  await boss.createQueue(SEARCH_QUEUE, {
    name: SEARCH_QUEUE,
    retryLimit: 3,
    retryDelay: 1,
    expireInSeconds: expireSeconds(),
  });
  return boss;
}

/** One pg-boss instance per process. */
export function getBoss(): Promise<PgBoss> {
  if (!store.caryatidBoss) {
    store.caryatidBoss = startBoss().catch((error: unknown) => {
      store.caryatidBoss = undefined;
      throw error;
    });
  }
  return store.caryatidBoss;
}

export async function stopBoss(): Promise<void> {
  const pending = store.caryatidBoss;
  store.caryatidBoss = undefined;
  if (pending) await (await pending).stop({ graceful: false, wait: true });
}

export async function enqueueSearch(searchId: string): Promise<string> {
  const boss = await getBoss();
  const jobId = await boss.send(SEARCH_QUEUE, { searchId } satisfies SearchJobData, {
    expireInSeconds: expireSeconds(),
    retryLimit: 3,
    retryDelay: 1,
  });
  if (!jobId) throw new Error("the queue refused the search job");
  return jobId;
}

/** Fails the jobs of searches whose worker went silent, so pg-boss retries them elsewhere. */
export async function reapSilentSearchJobs(reap: (seconds: number) => Promise<Array<{ id: string; jobId: string | null }>>): Promise<string[]> {
  const silent = await reap(silentSeconds());
  if (silent.length === 0) return [];
  const boss = await getBoss();
  for (const search of silent) {
    if (search.jobId) await boss.fail(SEARCH_QUEUE, search.jobId, { reason: "worker went silent" });
  }
  return silent.map((s) => s.id);
}

export async function cancelSearchJob(jobId: string): Promise<void> {
  const boss = await getBoss();
  await boss.cancel(SEARCH_QUEUE, jobId);
}
