/**
 * Column marks and their load combinations through the route handlers against the real
 * PostgreSQL: validation with field paths, roles, 409 on a stale version, k from ψ, and sway
 * parts refused on braced marks.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { callRoute } from "./support/session";
import { closeDb } from "./support/database";
import { createTestWorkspace, type TestWorkspace } from "./support/fixtures";
import * as marksRoute from "@/app/api/projects/[projectId]/marks/route";
import * as markRoute from "@/app/api/marks/[markId]/route";
import * as loadsRoute from "@/app/api/marks/[markId]/loads/route";
import * as loadRoute from "@/app/api/marks/[markId]/loads/[loadId]/route";
import * as checkInputRoute from "@/app/api/marks/[markId]/check-input/route";
import { createLoadAs, createMarkAs, createProjectAs, loadBody, markBody, sectionBody } from "./projects-support";

let ws: TestWorkspace;
let other: TestWorkspace;
let projectId: string;

beforeAll(async () => {
  ws = await createTestWorkspace();
  other = await createTestWorkspace();
  projectId = (await createProjectAs(ws.members.owner, ws.id, "Marks Project")).id;
});
afterAll(closeDb);

describe("column marks", () => {
  it("creates a mark, lists it with its load count, and reads it back", async () => {
    const mark = await createMarkAs(ws.members.engineer, projectId, markBody("A-1", "L1"));
    await createLoadAs(ws.members.engineer, mark.id, loadBody("1.4D", 200));
    const list = await callRoute<{ marks: Array<{ id: string; label: string; loads: number }> }>(marksRoute.GET, `/api/projects/${projectId}/marks`, {
      user: ws.members.reviewer,
      params: { projectId },
    });
    expect(list.status).toBe(200);
    expect(list.json.marks.find((m) => m.id === mark.id)).toMatchObject({ label: "A-1", loads: 1 });
    const read = await callRoute<{ mark: { design: unknown; member: unknown } }>(markRoute.GET, `/api/marks/${mark.id}`, { user: ws.members.estimator, params: { markId: mark.id } });
    expect(read.status).toBe(200);
    expect(read.json.mark.design).toEqual({ section: sectionBody, braceLevels: 0 });
  });

  it("computes k from ψ at both ends (braced ψA = ψB = 1 gives k ≈ 0.77, alignment chart, R6.2.5, from memory)", async () => {
    const body = markBody("PSI-1", "L1");
    const mark = await createMarkAs(ws.members.engineer, projectId, {
      ...body,
      member: { lu: 240, braced: true, psi: { x: { top: 1, bottom: 1 }, y: { top: 0, bottom: 0 } } },
    });
    const read = await callRoute<{ mark: { member: { kx: number; ky: number } } }>(markRoute.GET, `/api/marks/${mark.id}`, { user: ws.members.owner, params: { markId: mark.id } });
    expect(read.json.mark.member.kx).toBeCloseTo(0.774, 3);
    // both ends fixed (ψ = 0): the braced equation's lower bound k = 0.5 (closed form: fixed-fixed Euler column)
    expect(read.json.mark.member.ky).toBeCloseTo(0.5, 3);
  });

  it("reports invalid fields with their paths (400)", async () => {
    const body = markBody("BAD", "L1");
    const res = await callRoute<{ issues: Array<{ path: string }> }>(marksRoute.POST, `/api/projects/${projectId}/marks`, {
      method: "POST",
      user: ws.members.owner,
      params: { projectId },
      body: { ...body, quantity: 0, member: { lu: -5, braced: true }, design: { section: { ...sectionBody, b: undefined }, braceLevels: 0 } },
    });
    expect(res.status).toBe(400);
    expect(res.json.issues.map((i) => i.path).sort()).toEqual(["design.section.b", "member.lu", "quantity"]);
  });

  it("refuses a second mark with the same label and level (422 on label)", async () => {
    await createMarkAs(ws.members.owner, projectId, markBody("DUP", "L3"));
    const res = await callRoute<{ issues: Array<{ path: string }> }>(marksRoute.POST, `/api/projects/${projectId}/marks`, {
      method: "POST",
      user: ws.members.owner,
      params: { projectId },
      body: markBody("DUP", "L3"),
    });
    expect(res.status).toBe(422);
    expect(res.json.issues[0]?.path).toBe("label");
  });

  it("lets owners and engineers edit; estimators and reviewers 403; outsiders 404", async () => {
    for (const role of ["estimator", "reviewer"] as const) {
      const res = await callRoute(marksRoute.POST, `/api/projects/${projectId}/marks`, { method: "POST", user: ws.members[role], params: { projectId }, body: markBody(`R-${role}`) });
      expect(res.status, role).toBe(403);
    }
    const mark = await createMarkAs(ws.members.owner, projectId, markBody("ROLE-1"));
    const outsider = await callRoute(markRoute.GET, `/api/marks/${mark.id}`, { user: other.members.owner, params: { markId: mark.id } });
    expect(outsider.status).toBe(404);
    const reviewerPatch = await callRoute(markRoute.PATCH, `/api/marks/${mark.id}`, { method: "PATCH", user: ws.members.reviewer, params: { markId: mark.id }, body: { version: 1, quantity: 2 } });
    expect(reviewerPatch.status).toBe(403);
  });

  it("updates at the current version and answers a stale version with 409 and the current mark", async () => {
    const mark = await createMarkAs(ws.members.owner, projectId, markBody("VER-1"));
    const params = { markId: mark.id };
    const bigger = { section: { ...sectionBody, b: 20, h: 20 }, braceLevels: 1 };
    const ok = await callRoute<{ mark: { version: number } }>(markRoute.PATCH, `/api/marks/${mark.id}`, { method: "PATCH", user: ws.members.engineer, params, body: { version: 1, design: bigger } });
    expect(ok.status).toBe(200);
    expect(ok.json.mark.version).toBe(2);
    const stale = await callRoute<{ current: { version: number; design: unknown } }>(markRoute.PATCH, `/api/marks/${mark.id}`, {
      method: "PATCH",
      user: ws.members.owner,
      params,
      body: { version: 1, quantity: 9 },
    });
    expect(stale.status).toBe(409);
    expect(stale.json.current.version).toBe(2);
    expect(stale.json.current.design).toEqual(bigger);
  });

  it("builds the contract's check JSON from the mark, the project and the latest price book", async () => {
    const mark = await createMarkAs(ws.members.owner, projectId, { ...markBody("CI-1"), design: { section: sectionBody, braceLevels: 1 } });
    await createLoadAs(ws.members.owner, mark.id, loadBody("1.2D+1.6L", 310));
    const res = await callRoute<{ input: Record<string, unknown>; priceBook: { revision: number } }>(checkInputRoute.GET, `/api/marks/${mark.id}/check-input`, {
      user: ws.members.reviewer,
      params: { markId: mark.id },
    });
    expect(res.status).toBe(200);
    expect(res.json.priceBook.revision).toBe(1);
    expect(res.json.input).toMatchObject({
      section: sectionBody,
      member: { lu: 240, kx: 1, ky: 1, braced: true, braceLevels: 1 },
      options: { ei: "b", dagg: 0.75, exposure: "interior" },
      loads: [loadBody("1.2D+1.6L", 310)],
      prices: { steel: 1.15 },
    });
  });
});

describe("load combinations", () => {
  it("adds, replaces at the current version, refuses a stale version (409) and deletes", async () => {
    const mark = await createMarkAs(ws.members.owner, projectId, markBody("LC-1"));
    const load = await createLoadAs(ws.members.engineer, mark.id);
    const path = `/api/marks/${mark.id}/loads/${load.id}`;
    const params = { markId: mark.id, loadId: load.id };
    const put = await callRoute<{ load: { version: number; Pu: number; My?: unknown } }>(loadRoute.PUT, path, {
      method: "PUT",
      user: ws.members.engineer,
      params,
      body: { ...loadBody(), Pu: 333, My: undefined, version: 1 },
    });
    expect(put.status).toBe(200);
    expect(put.json.load).toMatchObject({ version: 2, Pu: 333 });
    expect(put.json.load.My).toBeUndefined();
    const stale = await callRoute<{ current: { Pu: number } }>(loadRoute.PUT, path, { method: "PUT", user: ws.members.owner, params, body: { ...loadBody(), version: 1 } });
    expect(stale.status).toBe(409);
    expect(stale.json.current.Pu).toBe(333);
    const staleDelete = await callRoute(loadRoute.DELETE, `${path}?version=1`, { method: "DELETE", user: ws.members.owner, params });
    expect(staleDelete.status).toBe(409);
    const del = await callRoute(loadRoute.DELETE, `${path}?version=2`, { method: "DELETE", user: ws.members.owner, params });
    expect(del.status).toBe(200);
    const list = await callRoute<{ loads: unknown[] }>(loadsRoute.GET, `/api/marks/${mark.id}/loads`, { user: ws.members.reviewer, params: { markId: mark.id } });
    expect(list.json.loads).toEqual([]);
  });

  it("validates a row: M1 ≤ M2, βdns in 0…1, a name; paths name the cell", async () => {
    const mark = await createMarkAs(ws.members.owner, projectId, markBody("LC-2"));
    const res = await callRoute<{ issues: Array<{ path: string }> }>(loadsRoute.POST, `/api/marks/${mark.id}/loads`, {
      method: "POST",
      user: ws.members.owner,
      params: { markId: mark.id },
      body: { name: "", Pu: 100, betaDns: 1.5, Mx: { M1: 900, M2: 800, curvature: "single" } },
    });
    expect(res.status).toBe(400);
    expect(res.json.issues.map((i) => i.path).sort()).toEqual(["Mx.M1", "betaDns", "name"]);
  });

  it("refuses a repeated name (422) and sway parts on a braced mark (422)", async () => {
    const mark = await createMarkAs(ws.members.owner, projectId, markBody("LC-3"));
    await createLoadAs(ws.members.owner, mark.id, loadBody("W1"));
    const dup = await callRoute<{ issues: Array<{ path: string }> }>(loadsRoute.POST, `/api/marks/${mark.id}/loads`, { method: "POST", user: ws.members.owner, params: { markId: mark.id }, body: loadBody("W1") });
    expect(dup.status).toBe(422);
    expect(dup.json.issues[0]?.path).toBe("name");
    const sway = await callRoute<{ issues: Array<{ path: string }> }>(loadsRoute.POST, `/api/marks/${mark.id}/loads`, {
      method: "POST",
      user: ws.members.owner,
      params: { markId: mark.id },
      body: { ...loadBody("W2"), Mx: { M1: 100, M2: 200, curvature: "double", M2s: 150 } },
    });
    expect(sway.status).toBe(422);
    expect(sway.json.issues[0]?.path).toBe("Mx.M2s");
  });

  it("lets only owners and engineers edit loads (estimator 403)", async () => {
    const mark = await createMarkAs(ws.members.owner, projectId, markBody("LC-4"));
    const res = await callRoute(loadsRoute.POST, `/api/marks/${mark.id}/loads`, { method: "POST", user: ws.members.estimator, params: { markId: mark.id }, body: loadBody() });
    expect(res.status).toBe(403);
  });
});
