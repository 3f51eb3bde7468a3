/**
 * Projects and price books through their route handlers against the real PostgreSQL: zod
 * validation (400 with the field's path), roles (owners and engineers edit projects, estimators
 * edit price books, reviewers read), outsiders 404, optimistic concurrency (409 carries the
 * current row), and the audit trail.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { closeDb, testDb } from "./support/database";
import { callRoute } from "./support/session";
import { createTestWorkspace, type TestWorkspace } from "./support/fixtures";
import { auditLog, priceBooks } from "@/db/schema";
import * as projectsRoute from "@/app/api/projects/route";
import * as projectRoute from "@/app/api/projects/[projectId]/route";
import * as priceBookRoute from "@/app/api/projects/[projectId]/price-book/route";
import { createProjectAs } from "./projects-support";

let ws: TestWorkspace;
let other: TestWorkspace;

beforeAll(async () => {
  ws = await createTestWorkspace();
  other = await createTestWorkspace();
});
afterAll(closeDb);

describe("POST /api/projects", () => {
  it("creates a project with defaults, revision 1 of a price book, and an audit row", async () => {
    const res = await callRoute<{ project: Record<string, unknown> }>(projectsRoute.POST, "/api/projects", {
      method: "POST",
      user: ws.members.engineer,
      body: { workspaceId: ws.id, name: "Quay Street Parking" },
    });
    expect(res.status).toBe(201);
    const project = res.json.project;
    expect(project).toMatchObject({ name: "Quay Street Parking", codeBasis: "ACI 318-19", units: "US", exposure: "interior", cover: 1.5, eiOption: "b", dagg: 0.75, version: 1 });
    const books = await testDb().select().from(priceBooks).where(eq(priceBooks.projectId, String(project.id)));
    expect(books.map((b) => b.revision)).toEqual([1]);
    const audit = await testDb().select().from(auditLog).where(and(eq(auditLog.entity, "project"), eq(auditLog.entityId, String(project.id))));
    expect(audit.map((a) => a.action)).toEqual(["create"]);
  });

  it("refuses invalid fields with 400 and the path of each", async () => {
    const res = await callRoute<{ issues: Array<{ path: string }> }>(projectsRoute.POST, "/api/projects", {
      method: "POST",
      user: ws.members.owner,
      body: { workspaceId: ws.id, name: "", units: "imperial", cover: -1, codeBasis: "ACI 318-14" },
    });
    expect(res.status).toBe(400);
    expect(res.json.issues.map((i) => i.path).sort()).toEqual(["codeBasis", "cover", "name", "units"]);
  });

  it("lets owners and engineers create; estimators and reviewers get 403; outsiders 404; anonymous 401", async () => {
    for (const role of ["estimator", "reviewer"] as const) {
      const res = await callRoute(projectsRoute.POST, "/api/projects", { method: "POST", user: ws.members[role], body: { workspaceId: ws.id, name: "Nope" } });
      expect(res.status, role).toBe(403);
    }
    const outsider = await callRoute(projectsRoute.POST, "/api/projects", { method: "POST", user: other.members.owner, body: { workspaceId: ws.id, name: "Nope" } });
    expect(outsider.status).toBe(404);
    const anonymous = await callRoute(projectsRoute.POST, "/api/projects", { method: "POST", body: { workspaceId: ws.id, name: "Nope" } });
    expect(anonymous.status).toBe(401);
    const owner = await callRoute(projectsRoute.POST, "/api/projects", { method: "POST", user: ws.members.owner, body: { workspaceId: ws.id, name: "Owner's" } });
    expect(owner.status).toBe(201);
  });
});

describe("GET /api/projects", () => {
  it("lists the workspace's projects to every role, and none of another workspace's", async () => {
    await createProjectAs(ws.members.owner, ws.id, "Listed Project");
    await createProjectAs(other.members.owner, other.id, "Elsewhere");
    const res = await callRoute<{ projects: Array<{ name: string; marks: number }>; canCreate: boolean }>(projectsRoute.GET, `/api/projects?workspaceId=${ws.id}`, {
      user: ws.members.reviewer,
    });
    expect(res.status).toBe(200);
    const names = res.json.projects.map((p) => p.name);
    expect(names).toContain("Listed Project");
    expect(names).not.toContain("Elsewhere");
    expect(res.json.canCreate).toBe(false);
  });
});

describe("PATCH /api/projects/[id]", () => {
  it("updates with the current version and refuses a stale one with 409 and the current row", async () => {
    const project = await createProjectAs(ws.members.owner, ws.id, "Versioned");
    const path = `/api/projects/${project.id}`;
    const params = { projectId: project.id };
    const first = await callRoute<{ project: { version: number; units: string } }>(projectRoute.PATCH, path, {
      method: "PATCH",
      user: ws.members.engineer,
      params,
      body: { version: 1, units: "SI", exposure: "exposed", cover: 2 },
    });
    expect(first.status).toBe(200);
    expect(first.json.project).toMatchObject({ version: 2, units: "SI" });

    const stale = await callRoute<{ error: string; current: { version: number; units: string; cover: number } }>(projectRoute.PATCH, path, {
      method: "PATCH",
      user: ws.members.owner,
      params,
      body: { version: 1, name: "Overwritten?" },
    });
    expect(stale.status).toBe(409);
    expect(stale.json.current).toMatchObject({ version: 2, units: "SI", cover: 2, name: "Versioned" });
  });

  it("is refused for estimators and reviewers (403) and outsiders (404)", async () => {
    const project = await createProjectAs(ws.members.owner, ws.id, "Guarded");
    for (const [user, status] of [
      [ws.members.estimator, 403],
      [ws.members.reviewer, 403],
      [other.members.owner, 404],
    ] as const) {
      const res = await callRoute(projectRoute.PATCH, `/api/projects/${project.id}`, { method: "PATCH", user, params: { projectId: project.id }, body: { version: 1, name: "x" } });
      expect(res.status).toBe(status);
    }
  });

  it("deletes only for owners, and only at the current version", async () => {
    const project = await createProjectAs(ws.members.owner, ws.id, "Short-lived");
    const params = { projectId: project.id };
    const engineer = await callRoute(projectRoute.DELETE, `/api/projects/${project.id}?version=1`, { method: "DELETE", user: ws.members.engineer, params });
    expect(engineer.status).toBe(403);
    const stale = await callRoute(projectRoute.DELETE, `/api/projects/${project.id}?version=7`, { method: "DELETE", user: ws.members.owner, params });
    expect(stale.status).toBe(409);
    const ok = await callRoute(projectRoute.DELETE, `/api/projects/${project.id}?version=1`, { method: "DELETE", user: ws.members.owner, params });
    expect(ok.status).toBe(200);
    const gone = await callRoute(projectRoute.GET, `/api/projects/${project.id}`, { user: ws.members.owner, params });
    expect(gone.status).toBe(404);
  });
});

describe("price book", () => {
  const book = (baseRevision: number, steel = 1.2) => ({
    baseRevision,
    prices: { concrete: { "5": 205, "6": 220 }, steel, formwork: 14, roundFormwork: 19, brace: 2500 },
    carbon: { concrete: { "5": 290, "6": 320 }, steel: 0.4 },
  });

  it("lets estimators write a new revision, refuses a stale base with 409, and keeps the history", async () => {
    const project = await createProjectAs(ws.members.owner, ws.id, "Priced");
    const path = `/api/projects/${project.id}/price-book`;
    const params = { projectId: project.id };
    const r2 = await callRoute<{ priceBook: { revision: number } }>(priceBookRoute.POST, path, { method: "POST", user: ws.members.estimator, params, body: book(1) });
    expect(r2.status).toBe(201);
    expect(r2.json.priceBook.revision).toBe(2);
    const stale = await callRoute<{ current: { revision: number; prices: { steel: number } } }>(priceBookRoute.POST, path, {
      method: "POST",
      user: ws.members.engineer,
      params,
      body: book(1, 9.99),
    });
    expect(stale.status).toBe(409);
    expect(stale.json.current).toMatchObject({ revision: 2, prices: { steel: 1.2 } });
    const history = await callRoute<{ revisions: Array<{ revision: number }> }>(priceBookRoute.GET, path, { user: ws.members.reviewer, params });
    expect(history.json.revisions.map((r) => r.revision)).toEqual([2, 1]);
  });

  it("refuses reviewers (403) and a concrete price without a carbon factor (400)", async () => {
    const project = await createProjectAs(ws.members.owner, ws.id, "Priced 2");
    const params = { projectId: project.id };
    const path = `/api/projects/${project.id}/price-book`;
    const reviewer = await callRoute(priceBookRoute.POST, path, { method: "POST", user: ws.members.reviewer, params, body: book(1) });
    expect(reviewer.status).toBe(403);
    const bad = book(1);
    bad.carbon.concrete = { "5": 290 } as typeof bad.carbon.concrete;
    const invalid = await callRoute<{ issues: Array<{ path: string }> }>(priceBookRoute.POST, path, { method: "POST", user: ws.members.owner, params, body: bad });
    expect(invalid.status).toBe(400);
    expect(invalid.json.issues.map((i) => i.path)).toEqual(["carbon.concrete.6"]);
  });
});
