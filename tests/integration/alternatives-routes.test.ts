/**
 * Proposing and approving alternatives through the real routes: role rules, optimistic
 * concurrency, the mark taking the approved design, stale detection and re-check, team e-mail.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { callRoute } from "./support/session";
import { createSlenderMark, SMALL_SPACE, type MarkFixture } from "./support/mark-fixture";
import { createTestWorkspace } from "./support/fixtures";
import { closeDb, testDb } from "./support/database";
import { columnMarks, loadCombinations, mailOutbox } from "@/db/schema";
import { readMarkInputs } from "@/db/queries/search-inputs";
import { claimSearch, completeSearch, insertSearch } from "@/db/queries/searches";
import { buildSearchRequest, fingerprintMark } from "@/lib/search-request";
import { toStoredCandidates } from "@/lib/jobs/process-search-job";
import { runSearchInProcess } from "@/optimizer/run-search";
import * as alternativesRoute from "@/app/api/marks/[markId]/alternatives/route";
import * as decisionRoute from "@/app/api/alternatives/[alternativeId]/decision/route";
import * as recheckRoute from "@/app/api/alternatives/[alternativeId]/recheck/route";

let fixture: MarkFixture;
let searchId: string;
let frontIds: string[];

type AlternativeView = { id: string; status: string; version: number; stale: boolean; candidateId: string };

beforeAll(async () => {
  fixture = await createSlenderMark();
  const inputs = await readMarkInputs(fixture.markId);
  if (!inputs) throw new Error("mark missing");
  const request = buildSearchRequest(inputs, { space: SMALL_SPACE });
  const row = await insertSearch({ markId: fixture.markId, request, inputsHash: fingerprintMark(inputs), priceBookId: fixture.priceBookId, createdBy: null });
  await claimSearch(row.id);
  const result = runSearchInProcess(request);
  await completeSearch(row.id, toStoredCandidates({ front: result.front, stats: result.stats }), result.stats);
  searchId = row.id;
  frontIds = result.front.map((e) => e.id);
  expect(frontIds.length).toBeGreaterThan(1);
}, 120_000);

afterAll(closeDb);

const propose = (user: MarkFixture["workspace"]["members"]["owner"], candidateId: string, comment = "") =>
  callRoute<{ alternative: AlternativeView }>(alternativesRoute.POST, `/api/marks/${fixture.markId}/alternatives`, {
    method: "POST",
    user,
    body: { searchId, candidateId, comment },
    params: { markId: fixture.markId },
  });

const decide = (user: MarkFixture["workspace"]["members"]["owner"], id: string, body: unknown) =>
  callRoute<{ alternative: AlternativeView; current?: AlternativeView }>(decisionRoute.POST, `/api/alternatives/${id}/decision`, {
    method: "POST",
    user,
    body,
    params: { alternativeId: id },
  });

describe("proposing and approving", () => {
  it("lets an estimator propose, refuses a reviewer (403) and another workspace (404)", async () => {
    expect((await propose(fixture.workspace.members.reviewer, frontIds[0] ?? "")).status).toBe(403);
    const stranger = (await createTestWorkspace()).members.estimator;
    expect((await propose(stranger, frontIds[0] ?? "")).status).toBe(404);
    const bad = await propose(fixture.workspace.members.estimator, "r99x99-f5-y60-8#8-p3x3-b0");
    expect(bad.status).toBe(422);
    const ok = await propose(fixture.workspace.members.estimator, frontIds[0] ?? "", "cheapest on the front");
    expect(ok.status).toBe(201);
    expect(ok.json.alternative.status).toBe("proposed");
    // Owners and engineers hear of it by e-mail (kept in the outbox whatever the SMTP server does).
    const mail = await testDb().select().from(mailOutbox).where(eq(mailOutbox.to, fixture.workspace.members.engineer.email));
    expect(mail.some((m) => m.subject.includes(frontIds[0] ?? "?"))).toBe(true);
  });

  it("an estimator cannot approve; an engineer approves and the mark carries the design", async () => {
    const proposed = await propose(fixture.workspace.members.estimator, frontIds[1] ?? "");
    const alt = proposed.json.alternative;
    expect((await decide(fixture.workspace.members.estimator, alt.id, { decision: "approve", version: alt.version })).status).toBe(403);
    const stale = await decide(fixture.workspace.members.engineer, alt.id, { decision: "approve", version: alt.version + 5 });
    expect(stale.status).toBe(409);
    const approved = await decide(fixture.workspace.members.engineer, alt.id, { decision: "approve", version: alt.version, comment: "fits the architect's grid" });
    expect(approved.status).toBe(200);
    expect(approved.json.alternative.status).toBe("approved");
    const [mark] = await testDb().select().from(columnMarks).where(eq(columnMarks.id, fixture.markId));
    const design = mark?.design as { section: { b: number; h: number }; braceLevels: number };
    const parts = /^r(\d+)x(\d+)-.*-b(\d+)$/.exec(frontIds[1] ?? "");
    expect([design.section.b, design.section.h, design.braceLevels]).toEqual([Number(parts?.[1]), Number(parts?.[2]), Number(parts?.[3])]);
    // Deciding twice is a conflict, not a silent overwrite.
    expect((await decide(fixture.workspace.members.engineer, alt.id, { decision: "reject", version: approved.json.alternative.version, comment: "no" })).status).toBe(409);
  });

  it("a rejection needs a reason", async () => {
    const proposed = await propose(fixture.workspace.members.estimator, frontIds[0] ?? "");
    const res = await callRoute<{ issues: Array<{ path: string }> }>(decisionRoute.POST, `/api/alternatives/${proposed.json.alternative.id}/decision`, {
      method: "POST",
      user: fixture.workspace.members.engineer,
      body: { decision: "reject", version: proposed.json.alternative.version },
      params: { alternativeId: proposed.json.alternative.id },
    });
    expect(res.status).toBe(400);
    expect(res.json.issues[0]?.path).toBe("comment");
  });

  it("goes stale when the loads change, and a re-check makes it current again while it still passes", async () => {
    const list = async () =>
      (await callRoute<{ alternatives: AlternativeView[] }>(alternativesRoute.GET, `/api/marks/${fixture.markId}/alternatives`, {
        user: fixture.workspace.members.reviewer,
        params: { markId: fixture.markId },
      })).json.alternatives;
    const approved = (await list()).find((a) => a.status === "approved");
    expect(approved?.stale).toBe(false);
    await testDb().update(loadCombinations).set({ Pu: 405 }).where(eq(loadCombinations.markId, fixture.markId));
    const stale = (await list()).find((a) => a.id === approved?.id);
    expect(stale?.stale).toBe(true);
    const recheck = await callRoute<{ pass: boolean; alternative: AlternativeView }>(recheckRoute.POST, `/api/alternatives/${approved?.id}/recheck`, {
      method: "POST",
      user: fixture.workspace.members.engineer,
      params: { alternativeId: approved?.id ?? "" },
    });
    expect(recheck.status).toBe(200);
    // A lighter load: the approved design still passes, so it is current again.
    expect(recheck.json.pass).toBe(true);
    expect(recheck.json.alternative.stale).toBe(false);
    const reviewer = await callRoute(recheckRoute.POST, `/api/alternatives/${approved?.id}/recheck`, {
      method: "POST",
      user: fixture.workspace.members.reviewer,
      params: { alternativeId: approved?.id ?? "" },
    });
    expect(reviewer.status).toBe(403);
  });
});
