/**
 * The search queue on pg-boss, in the same PostgreSQL as everything else: any number of worker
 * processes on any number of machines pointed at that database share the queue with no code change.
 * A job whose worker dies stays "active" until it expires (SEARCH_JOB_EXPIRE_SECONDS), then pg-boss
 * hands it to another worker (retryLimit), which re-runs the search from the stored request.
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
  return Number(process.env.SEARCH_JOB_EXPIRE_SECONDS ?? 300);
}

async function startBoss(): Promise<PgBoss> {
  const boss = new PgBoss({
    connectionString: databaseUrl(),
    schema: "pgboss",
    max: 4,
    // How often expired (orphaned) jobs are found and retried.
    maintenanceIntervalSeconds: Number(process.env.SEARCH_MAINTENANCE_SECONDS ?? 30),
    monitorStateIntervalSeconds: undefined,
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

export async function cancelSearchJob(jobId: string): Promise<void> {
  const boss = await getBoss();
  await boss.cancel(SEARCH_QUEUE, jobId);
}
