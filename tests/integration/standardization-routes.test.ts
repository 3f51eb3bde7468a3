/**
 * Project-wide standardization over stored search results, through the real routes and database.
 * Searches are run in-process with the same optimizer the workers use and stored as a worker would.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { callRoute } from "./support/session";
import { addMark, createSlenderMark, SMALL_SPACE, type MarkFixture } from "./support/mark-fixture";
import { createTestWorkspace } from "./support/fixtures";
import { closeDb, testDb } from "./support/database";
import { adoptedAlternatives, columnMarks } from "@/db/schema";
import { readMarkInputs } from "@/db/queries/search-inputs";
import { claimSearch, completeSearch, insertSearch } from "@/db/queries/searches";
import { buildSearchRequest, fingerprintMark } from "@/lib/search-request";
import { toStoredCandidates } from "@/lib/jobs/process-search-job";
import { describeCandidate } from "@/lib/jobs/optimizer-runner";
import { runSearchInProcess } from "@/optimizer/run-search";
import * as sweepRoute from "@/app/api/projects/[projectId]/standardization/route";
import * as adoptRoute from "@/app/api/projects/[projectId]/standardization/adopt/route";

let fixture: MarkFixture;
let secondMark: string;
let thirdMark: string;

/** Runs a mark's search the way a worker does and stores the results. */
async function searchAndStore(markId: string): Promise<void> {
  const inputs = await readMarkInputs(markId);
  if (!inputs) throw new Error("mark missing");
  const request = buildSearchRequest(inputs, { space: SMALL_SPACE });
  const row = await insertSearch({ markId, request, inputsHash: fingerprintMark(inputs), priceBookId: inputs.priceBook?.id ?? null, createdBy: null });
  await claimSearch(row.id);
  const result = runSearchInProcess(request);
  const front = new Set(result.front.map((e) => e.id));
  await completeSearch(
    row.id,
    toStoredCandidates({ front: result.front, passing: result.passing.filter((p) => !front.has(p.id)).map(describeCandidate), stats: result.stats }),
    result.stats,
  );
}

type SweepEntry = { feasible: boolean; maxOutlines: number; totalCost: number | null; outlines: unknown[]; assignment: Array<{ markId: string; cost: number; ownCheapestCost: number }> };
type SweepBody = { sweep: SweepEntry[]; missing: Array<{ label: string }>; formSetCost: number };

beforeAll(async () => {
  fixture = await createSlenderMark();
  secondMark = await addMark(fixture.projectId, { label: "D-8", level: "Mezzanine", quantity: 2, Pu: 250 });
  thirdMark = await addMark(fixture.projectId, { label: "E-2", level: "Roof", quantity: 5, Pu: 120 });
  await searchAndStore(fixture.markId);
  await searchAndStore(secondMark);
}, 120_000);

afterAll(closeDb);

function sweepAs(user: MarkFixture["workspace"]["members"]["owner"], body: unknown = {}) {
  return callRoute<SweepBody>(sweepRoute.POST, `/api/projects/${fixture.projectId}/standardization`, {
    method: "POST",
    user,
    body,
    params: { projectId: fixture.projectId },
  });
}

describe("POST /api/projects/:id/standardization", () => {
  it("names the marks that have no finished search and refuses to adopt until they do", async () => {
    const res = await sweepAs(fixture.workspace.members.reviewer);
    expect(res.status).toBe(200);
    expect(res.json.missing.map((m) => m.label)).toEqual(["E-2"]);
    const adopt = await callRoute<{ issues: Array<{ message: string }> }>(adoptRoute.POST, `/api/projects/${fixture.projectId}/standardization/adopt`, {
      method: "POST",
      user: fixture.workspace.members.engineer,
      body: { maxOutlines: 1 },
      params: { projectId: fixture.projectId },
    });
    expect(adopt.status).toBe(422);
    expect(adopt.json.issues[0]?.message).toContain("E-2");
    await searchAndStore(thirdMark);
  }, 60_000);

  it("sweeps N = 1 … marks: cost never rises with N, and N = marks gives each mark its own cheapest", async () => {
    const res = await sweepAs(fixture.workspace.members.estimator);
    expect(res.status).toBe(200);
    const sweep = res.json.sweep;
    expect(sweep.map((s) => s.maxOutlines)).toEqual([1, 2, 3]);
    const feasible = sweep.filter((s) => s.feasible);
    expect(feasible.length).toBeGreaterThan(0);
    for (let i = 1; i < feasible.length; i++) {
      expect(feasible[i]?.totalCost ?? Infinity).toBeLessThanOrEqual((feasible[i - 1]?.totalCost ?? Infinity) + 1e-6);
    }
    const last = sweep[sweep.length - 1];
    expect(last?.feasible).toBe(true);
    for (const entry of last?.assignment ?? []) expect(entry.cost).toBeCloseTo(entry.ownCheapestCost, 2);
    expect(res.json.formSetCost).toBe(900);
  });

  it("refuses strangers with 404 and anonymous callers with 401", async () => {
    const stranger = (await createTestWorkspace()).members.owner;
    expect((await sweepAs(stranger)).status).toBe(404);
    const anonymous = await callRoute(sweepRoute.POST, `/api/projects/${fixture.projectId}/standardization`, {
      method: "POST",
      body: {},
      params: { projectId: fixture.projectId },
    });
    expect(anonymous.status).toBe(401);
  });
});

describe("POST /api/projects/:id/standardization/adopt", () => {
  const adopt = (user: MarkFixture["workspace"]["members"]["owner"], maxOutlines: number) =>
    callRoute<{ adopted: Array<{ markId: string; status: string; candidateId: string }> }>(adoptRoute.POST, `/api/projects/${fixture.projectId}/standardization/adopt`, {
      method: "POST",
      user,
      body: { maxOutlines },
      params: { projectId: fixture.projectId },
    });

  it("refuses reviewers", async () => {
    expect((await adopt(fixture.workspace.members.reviewer, 1)).status).toBe(403);
  });

  it("an estimator proposes every mark's candidate; the marks keep their designs", async () => {
    const before = await testDb().select().from(columnMarks).where(eq(columnMarks.projectId, fixture.projectId));
    const res = await adopt(fixture.workspace.members.estimator, 3);
    expect(res.status).toBe(201);
    expect(res.json.adopted).toHaveLength(3);
    expect(res.json.adopted.every((a) => a.status === "proposed")).toBe(true);
    const after = await testDb().select().from(columnMarks).where(eq(columnMarks.projectId, fixture.projectId));
    expect(after.map((m) => m.design)).toEqual(before.map((m) => m.design));
  });

  it("an engineer adopts the whole assignment: each mark is approved and carries its candidate's outline", async () => {
    const res = await adopt(fixture.workspace.members.engineer, 1);
    expect(res.status).toBe(201);
    expect(res.json.adopted.every((a) => a.status === "approved")).toBe(true);
    const outlines = new Set<string>();
    for (const a of res.json.adopted) {
      const [mark] = await testDb().select().from(columnMarks).where(eq(columnMarks.id, a.markId));
      const section = (mark?.design as { section: { b: number; h: number } }).section;
      outlines.add([section.b, section.h].sort((x, y) => x - y).join("x"));
      const [alt] = await testDb().select().from(adoptedAlternatives).where(eq(adoptedAlternatives.candidateId, a.candidateId));
      expect(alt).toBeDefined();
    }
    // One distinct outline for the whole project (rotations share a form set).
    expect(outlines.size).toBe(1);
  });
});
