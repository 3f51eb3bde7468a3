/**
 * The search job lifecycle in the database: queued → running (progress, candidates kept) → done |
 * failed | cancelled. The worker writes results in one transaction that first clears any partial
 * rows of an earlier attempt, so a retried job never leaves duplicate or lost candidates.
 */
import { and, asc, desc, eq, inArray, lt, sql } from "drizzle-orm";
import { getDb } from "../client";
import { candidates, searches } from "../schema";

export type SearchRow = typeof searches.$inferSelect;

export interface NewSearch {
  markId: string;
  request: unknown;
  inputsHash: string;
  priceBookId: string | null;
  createdBy: string | null;
}

export async function insertSearch(values: NewSearch): Promise<SearchRow> {
  const [row] = await getDb().insert(searches).values(values).returning();
  if (!row) throw new Error("search insert returned nothing");
  return row;
}

export async function setSearchJobId(searchId: string, jobId: string): Promise<void> {
  await getDb().update(searches).set({ jobId, updatedAt: new Date() }).where(eq(searches.id, searchId));
}

export async function findSearch(searchId: string): Promise<SearchRow | null> {
  const [row] = await getDb().select().from(searches).where(eq(searches.id, searchId));
  return row ?? null;
}

export async function listSearchesOfMark(markId: string): Promise<SearchRow[]> {
  return getDb().select().from(searches).where(eq(searches.markId, markId)).orderBy(desc(searches.createdAt));
}

/**
 * Takes the search for a worker attempt. Returns null when it must not run (cancelled, finished,
 * or unknown). A search already "running" may be taken again: its worker died and the queue
 * handed the job on.
 */
export async function claimSearch(searchId: string): Promise<SearchRow | null> {
  const [row] = await getDb()
    .update(searches)
    .set({
      status: "running",
      attempt: sql`${searches.attempt} + 1`,
      startedAt: new Date(),
      progress: 0,
      kept: 0,
      updatedAt: new Date(),
      version: sql`${searches.version} + 1`,
    })
    .where(and(eq(searches.id, searchId), inArray(searches.status, ["queued", "running"])))
    .returning();
  return row ?? null;
}

export async function recordProgress(searchId: string, progress: number, kept: number): Promise<void> {
  await getDb()
    .update(searches)
    .set({ progress: Math.min(1, Math.max(0, progress)), kept, updatedAt: new Date() })
    .where(and(eq(searches.id, searchId), eq(searches.status, "running")));
}

export async function searchStatus(searchId: string): Promise<SearchRow["status"] | null> {
  const [row] = await getDb().select({ status: searches.status }).from(searches).where(eq(searches.id, searchId));
  return row?.status ?? null;
}

/**
 * The running worker's heartbeat, which also reads whether someone cancelled the search: one
 * statement, so a live search is touched every beat and a cancelled one is seen at once.
 */
export async function beatSearch(searchId: string): Promise<SearchRow["status"] | null> {
  const rows = await getDb()
    .update(searches)
    .set({ updatedAt: new Date() })
    .where(and(eq(searches.id, searchId), eq(searches.status, "running")))
    .returning({ status: searches.status });
  if (rows.length > 0) return "running";
  return searchStatus(searchId);
}

/**
 * Running searches whose worker has stopped beating (the process or its machine died). Each row
 * is returned to exactly one caller: the same statement pushes its heartbeat forward, so other
 * workers' reapers skip it while the job is handed on.
 */
export async function reapSilentSearches(silentSeconds: number): Promise<Array<{ id: string; jobId: string | null }>> {
  const cutoff = new Date(Date.now() - silentSeconds * 1000);
  return getDb()
    .update(searches)
    .set({ updatedAt: new Date() })
    .where(and(eq(searches.status, "running"), lt(searches.updatedAt, cutoff)))
    .returning({ id: searches.id, jobId: searches.jobId });
}

export interface StoredCandidate {
  candidateId: string;
  shape: string;
  cost: number;
  carbon: number;
  utilization: number;
  onFront: boolean;
  data: unknown;
}

/** Writes the results of one attempt atomically; a search cancelled meanwhile keeps no results. */
export async function completeSearch(searchId: string, rows: StoredCandidate[], stats: unknown): Promise<boolean> {
  return getDb().transaction(async (tx) => {
    const [current] = await tx
      .select({ status: searches.status })
      .from(searches)
      .where(eq(searches.id, searchId))
      .for("update");
    if (current?.status !== "running") return false;
    await tx.delete(candidates).where(eq(candidates.searchId, searchId));
    for (let i = 0; i < rows.length; i += 500) {
      const chunk = rows.slice(i, i + 500).map((r) => ({ ...r, searchId }));
      if (chunk.length > 0) await tx.insert(candidates).values(chunk);
    }
    await tx
      .update(searches)
      .set({ status: "done", progress: 1, kept: rows.length, stats, finishedAt: new Date(), updatedAt: new Date(), error: null })
      .where(eq(searches.id, searchId));
    return true;
  });
}

export async function failSearch(searchId: string, message: string): Promise<void> {
  await getDb()
    .update(searches)
    .set({ status: "failed", error: message.slice(0, 1000), finishedAt: new Date(), updatedAt: new Date() })
    .where(and(eq(searches.id, searchId), inArray(searches.status, ["queued", "running"])));
}

/** Cancels a queued or running search; returns false when it had already finished. */
export async function cancelSearch(searchId: string): Promise<boolean> {
  const rows = await getDb()
    .update(searches)
    .set({ status: "cancelled", finishedAt: new Date(), updatedAt: new Date(), version: sql`${searches.version} + 1` })
    .where(and(eq(searches.id, searchId), inArray(searches.status, ["queued", "running"])))
    .returning({ id: searches.id });
  return rows.length > 0;
}

export async function listCandidates(searchId: string, options: { frontOnly?: boolean } = {}) {
  const where = options.frontOnly
    ? and(eq(candidates.searchId, searchId), eq(candidates.onFront, true))
    : eq(candidates.searchId, searchId);
  return getDb().select().from(candidates).where(where).orderBy(asc(candidates.cost), asc(candidates.utilization), asc(candidates.candidateId));
}

export async function findCandidate(searchId: string, candidateId: string) {
  const [row] = await getDb()
    .select()
    .from(candidates)
    .where(and(eq(candidates.searchId, searchId), eq(candidates.candidateId, candidateId)));
  return row ?? null;
}
