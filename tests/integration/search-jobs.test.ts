/**
 * The search job lifecycle against the real PostgreSQL, pg-boss and worker processes:
 * queued → running with progress → done; cancelled; a worker killed mid-run and the job finished
 * by another worker with no duplicate or lost results; role rules on the search routes.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq, sql } from "drizzle-orm";
import { callRoute } from "./support/session";
import { createSlenderMark, SMALL_SPACE, type MarkFixture } from "./support/mark-fixture";
import { startWorker, waitFor, type WorkerHandle } from "./support/worker-process";
import { createTestWorkspace } from "./support/fixtures";
import { closeDb, testDb } from "./support/database";
import { candidates, loadCombinations, searches } from "@/db/schema";
import { stopBoss } from "@/lib/jobs/search-queue";
import { runSearchInProcess } from "@/optimizer/run-search";
import * as markSearches from "@/app/api/marks/[markId]/searches/route";
import * as searchRoute from "@/app/api/searches/[searchId]/route";
import * as cancelRoute from "@/app/api/searches/[searchId]/cancel/route";
import * as candidatesRoute from "@/app/api/searches/[searchId]/candidates/route";
// @ts-expect-error -- a plain ESM build script without type declarations
import { ensureWorkerBundle } from "../../scripts/build-workers.mjs";

// A silent search is handed on after 3 s (4+ missed heartbeats), so the test need not wait long.
const JOB_ENV = { SEARCH_SILENT_SECONDS: "3", SEARCH_POLL_SECONDS: "0.5" };
Object.assign(process.env, JOB_ENV);

/** The documented default space (a few seconds on one thread): long enough to stop a worker mid-run. */
const DEFAULT_SPACE = {};
/** A much larger space, for cancelling while it runs. */
const LARGE_SPACE = { shapes: ["rect", "circle"], b: [12, 40, 1], h: [12, 40, 1], D: [12, 40, 1], fc: [4, 5, 6, 8], braceLevels: [0, 1, 2] };

let fixture: MarkFixture;
const workers: WorkerHandle[] = [];

type SearchView = { id: string; status: string; progress: number; kept: number; attempt: number; stale: boolean };

async function startSearch(space: unknown, as = fixture.workspace.members.estimator) {
  return callRoute<{ search: SearchView }>(markSearches.POST, `/api/marks/${fixture.markId}/searches`, {
    method: "POST",
    user: as,
    body: { space },
    params: { markId: fixture.markId },
  });
}

async function readSearch(id: string): Promise<SearchView> {
  const res = await callRoute<{ search: SearchView }>(searchRoute.GET, `/api/searches/${id}`, {
    user: fixture.workspace.members.reviewer,
    params: { searchId: id },
  });
  expect(res.status).toBe(200);
  return res.json.search;
}

beforeAll(async () => {
  await ensureWorkerBundle();
  fixture = await createSlenderMark();
}, 120_000);

afterAll(async () => {
  await Promise.all(workers.map((w) => w.stop()));
  await stopBoss();
  await closeDb();
});

describe("search routes: roles", () => {
  it("lets estimators and engineers start searches, refuses reviewers (403) and strangers (404)", async () => {
    const reviewer = await startSearch(SMALL_SPACE, fixture.workspace.members.reviewer);
    expect(reviewer.status).toBe(403);
    const stranger = (await createTestWorkspace()).members.engineer;
    const foreign = await startSearch(SMALL_SPACE, stranger);
    expect(foreign.status).toBe(404);
    const anonymous = await callRoute(markSearches.POST, `/api/marks/${fixture.markId}/searches`, {
      method: "POST",
      body: { space: SMALL_SPACE },
      params: { markId: fixture.markId },
    });
    expect(anonymous.status).toBe(401);
  });

  it("rejects a bad space with the field named", async () => {
    const res = await callRoute<{ issues: Array<{ path: string }> }>(markSearches.POST, `/api/marks/${fixture.markId}/searches`, {
      method: "POST",
      user: fixture.workspace.members.engineer,
      body: { space: { b: [30, 12, 2] } },
      params: { markId: fixture.markId },
    });
    expect(res.status).toBe(400);
    expect(res.json.issues[0]?.path).toBe("space.b");
  });
});

describe("search job lifecycle", () => {
  beforeAll(() => {
    workers.push(startWorker("w-main", { SEARCH_THREADS: "2" }));
  });

  it("runs queued → running → done on a worker and stores exactly the optimizer's front", async () => {
    const started = await startSearch(SMALL_SPACE);
    expect(started.status).toBe(201);
    const id = started.json.search.id;
    expect(started.json.search.status).toBe("queued");

    const done = await waitFor(async () => {
      const s = await readSearch(id);
      return s.status === "done" || s.status === "failed" ? s : null;
    }, 60_000, "the search to finish");
    expect(done.status).toBe("done");
    expect(done.progress).toBe(1);
    expect(done.attempt).toBe(1);

    const stored = await callRoute<{ candidates: Array<{ id: string; onFront: boolean; utilization: number }> }>(
      candidatesRoute.GET,
      `/api/searches/${id}/candidates?front=1`,
      { user: fixture.workspace.members.reviewer, params: { searchId: id } },
    );
    expect(stored.status).toBe(200);
    // The same request run in-process gives the same front (the worker adds nothing and loses nothing).
    const [row] = await testDb().select().from(searches).where(eq(searches.id, id));
    const direct = runSearchInProcess(row?.request);
    expect(stored.json.candidates.map((c) => c.id)).toEqual(direct.front.map((e) => e.id));
    expect(stored.json.candidates.every((c) => c.onFront && c.utilization <= 1)).toBe(true);
  }, 90_000);

  it("shows progress while running and stops when cancelled, keeping no results", async () => {
    const started = await startSearch(LARGE_SPACE);
    const id = started.json.search.id;
    // Live progress: the fraction done rises above zero while the search runs.
    const running = await waitFor(async () => {
      const s = await readSearch(id);
      return (s.status === "running" && s.progress > 0) || s.status === "done" ? s : null;
    }, 30_000, "the search to report progress", 20);
    expect(running.status).toBe("running");
    expect(running.progress).toBeGreaterThan(0);
    expect(running.progress).toBeLessThan(1);
    const cancel = await callRoute<{ search: SearchView }>(cancelRoute.POST, `/api/searches/${id}/cancel`, {
      method: "POST",
      user: fixture.workspace.members.estimator,
      params: { searchId: id },
    });
    expect(cancel.status).toBe(200);
    expect(cancel.json.search.status).toBe("cancelled");
    // The worker notices within its poll interval and writes nothing afterwards.
    await new Promise((r) => setTimeout(r, 2500));
    const after = await readSearch(id);
    expect(after.status).toBe("cancelled");
    const rows = await testDb().select().from(candidates).where(eq(candidates.searchId, id));
    expect(rows).toHaveLength(0);
    const again = await callRoute(cancelRoute.POST, `/api/searches/${id}/cancel`, {
      method: "POST",
      user: fixture.workspace.members.estimator,
      params: { searchId: id },
    });
    expect(again.status).toBe(409);
  }, 90_000);

  it("hands the job of a worker killed mid-run to another worker, with no duplicate or lost results", async () => {
    await Promise.all(workers.splice(0).map((w) => w.stop()));
    const doomed = startWorker("w-doomed", { SEARCH_THREADS: "1" });
    const started = await startSearch(DEFAULT_SPACE);
    const id = started.json.search.id;
    await waitFor(async () => (await readSearch(id)).status === "running", 30_000, "the doomed worker to take the job", 20);
    await doomed.kill();
    const orphaned = await readSearch(id);
    expect(orphaned.status).toBe("running");
    expect(orphaned.attempt).toBe(1);

    const rescuer = startWorker("w-rescuer", { SEARCH_THREADS: "2" });
    workers.push(rescuer);
    const done = await waitFor(async () => {
      const s = await readSearch(id);
      return s.status === "done" || s.status === "failed" ? s : null;
    }, 80_000, "the rescuing worker to finish", 200);
    expect(done.status).toBe("done");
    expect(done.attempt).toBe(2);
    const [dupes] = await testDb()
      .select({ n: sql<number>`count(*) - count(distinct ${candidates.candidateId})` })
      .from(candidates)
      .where(eq(candidates.searchId, id));
    expect(Number(dupes?.n)).toBe(0);
    const [row] = await testDb().select().from(searches).where(eq(searches.id, id));
    const direct = runSearchInProcess(row?.request);
    const front = await testDb().select().from(candidates).where(eq(candidates.searchId, id));
    expect(front.filter((c) => c.onFront).map((c) => c.candidateId).sort()).toEqual(direct.front.map((e) => e.id).sort());
    expect(rescuer.output()).toContain(`took search ${id}`);
  }, 120_000);

  it("marks a search stale when the mark's loads change after it ran", async () => {
    const before = await testDb().select().from(searches).where(eq(searches.markId, fixture.markId));
    expect(before.length).toBeGreaterThan(0);
    const id = before[0]?.id ?? "";
    expect((await readSearch(id)).stale).toBe(false);
    await testDb().update(loadCombinations).set({ Pu: 431 }).where(eq(loadCombinations.markId, fixture.markId));
    expect((await readSearch(id)).stale).toBe(true);
  });
});
