/**
 * Every workspace route × every role, against the real PostgreSQL: allowed roles get 2xx, other
 * members 403, a signed-in outsider 404 (the workspace's existence is not confirmed), and an
 * anonymous request 401. Also: ids from another workspace used under one's own workspace are 404.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { closeDb, testDb } from "./support/database";
import { callRoute } from "./support/session";
import { createTestUser, createTestWorkspace, uniqueEmail, type TestUser, type TestWorkspace } from "./support/fixtures";
import { memberships } from "@/db/schema";
import { ROLES, type Role } from "@/lib/permissions";
import { createInvitation } from "@/db/queries/invitations";
import * as workspacesRoute from "@/app/api/workspaces/route";
import * as workspaceRoute from "@/app/api/workspaces/[workspaceId]/route";
import * as membersRoute from "@/app/api/workspaces/[workspaceId]/members/route";
import * as memberRoute from "@/app/api/workspaces/[workspaceId]/members/[memberId]/route";
import * as invitationsRoute from "@/app/api/workspaces/[workspaceId]/invitations/route";
import * as invitationRoute from "@/app/api/workspaces/[workspaceId]/invitations/[invitationId]/route";
import * as mailRoute from "@/app/api/workspaces/[workspaceId]/mail/route";
import * as mailRetryRoute from "@/app/api/workspaces/[workspaceId]/mail/retry/route";
import * as auditRoute from "@/app/api/workspaces/[workspaceId]/audit/route";

let a: TestWorkspace;
let b: TestWorkspace;

beforeAll(async () => {
  a = await createTestWorkspace();
  b = await createTestWorkspace();
});
afterAll(closeDb);

async function addMember(workspaceId: string, role: Role): Promise<string> {
  const user = await createTestUser(`extra-${role}`);
  const [row] = await testDb().insert(memberships).values({ workspaceId, userId: user.id, role }).returning();
  if (!row) throw new Error("membership insert failed");
  return row.id;
}

type Route = Parameters<typeof callRoute>[0];

interface RouteCase {
  name: string;
  route: Route;
  method: string;
  allowed: readonly Role[];
  /** builds path, params and body for one call in workspace `ws` (fresh targets per call) */
  prepare: (ws: TestWorkspace, actor: TestUser) => Promise<{ path: string; params: Record<string, string>; body?: unknown }>;
}

const base = (ws: TestWorkspace) => ({ workspaceId: ws.id });

const cases: RouteCase[] = [
  { name: "GET /api/workspaces/[id]", route: workspaceRoute.GET, method: "GET", allowed: ROLES, prepare: async (ws) => ({ path: `/api/workspaces/${ws.id}`, params: base(ws) }) },
  { name: "GET members", route: membersRoute.GET, method: "GET", allowed: ROLES, prepare: async (ws) => ({ path: `/api/workspaces/${ws.id}/members`, params: base(ws) }) },
  {
    name: "PATCH member role",
    route: memberRoute.PATCH,
    method: "PATCH",
    allowed: ["owner"],
    prepare: async (ws) => {
      const memberId = await addMember(ws.id, "reviewer");
      return { path: `/api/workspaces/${ws.id}/members/${memberId}`, params: { ...base(ws), memberId }, body: { role: "estimator" } };
    },
  },
  {
    name: "DELETE member (someone else)",
    route: memberRoute.DELETE,
    method: "DELETE",
    allowed: ["owner"],
    prepare: async (ws) => {
      const memberId = await addMember(ws.id, "engineer");
      return { path: `/api/workspaces/${ws.id}/members/${memberId}`, params: { ...base(ws), memberId } };
    },
  },
  { name: "GET invitations", route: invitationsRoute.GET, method: "GET", allowed: ["owner"], prepare: async (ws) => ({ path: `/api/workspaces/${ws.id}/invitations`, params: base(ws) }) },
  {
    name: "POST invitation",
    route: invitationsRoute.POST,
    method: "POST",
    allowed: ["owner"],
    prepare: async (ws) => ({ path: `/api/workspaces/${ws.id}/invitations`, params: base(ws), body: { email: uniqueEmail("invitee"), role: "reviewer" } }),
  },
  {
    name: "DELETE invitation",
    route: invitationRoute.DELETE,
    method: "DELETE",
    allowed: ["owner"],
    prepare: async (ws) => {
      const { invitation } = await createInvitation(ws.members.owner, ws.id, uniqueEmail("revokee"), "engineer");
      return { path: `/api/workspaces/${ws.id}/invitations/${invitation.id}`, params: { ...base(ws), invitationId: invitation.id } };
    },
  },
  { name: "GET mail", route: mailRoute.GET, method: "GET", allowed: ["owner"], prepare: async (ws) => ({ path: `/api/workspaces/${ws.id}/mail`, params: base(ws) }) },
  { name: "POST mail/retry", route: mailRetryRoute.POST, method: "POST", allowed: ["owner"], prepare: async (ws) => ({ path: `/api/workspaces/${ws.id}/mail/retry`, params: base(ws) }) },
  { name: "GET audit", route: auditRoute.GET, method: "GET", allowed: ["owner"], prepare: async (ws) => ({ path: `/api/workspaces/${ws.id}/audit`, params: base(ws) }) },
];

describe.each(cases)("$name", (c) => {
  it.each(ROLES)("as %s: allowed only for the permitted roles", async (role) => {
    const actor = a.members[role];
    const call = await c.prepare(a, actor);
    const res = await callRoute(c.route, call.path, { method: c.method, user: actor, params: call.params, body: call.body });
    if (c.allowed.includes(role)) expect(res.status, JSON.stringify(res.json)).toBeLessThan(300);
    else {
      expect(res.status).toBe(403);
      expect(String(res.json.error)).toContain(role);
    }
  });

  it("as the owner of another workspace: 404, the workspace is not confirmed", async () => {
    const call = await c.prepare(a, a.members.owner);
    const res = await callRoute(c.route, call.path, { method: c.method, user: b.members.owner, params: call.params, body: call.body });
    expect(res.status).toBe(404);
  });

  it("signed out: 401", async () => {
    const call = await c.prepare(a, a.members.owner);
    const res = await callRoute(c.route, call.path, { method: c.method, params: call.params, body: call.body });
    expect(res.status).toBe(401);
  });
});

describe("workspace routes with ids from another workspace", () => {
  it("an owner cannot change or remove a member of another workspace through their own workspace's path", async () => {
    const foreignMember = await addMember(b.id, "engineer");
    const params = { workspaceId: a.id, memberId: foreignMember };
    const patch = await callRoute(memberRoute.PATCH, `/api/workspaces/${a.id}/members/${foreignMember}`, {
      method: "PATCH", user: a.members.owner, params, body: { role: "owner" },
    });
    expect(patch.status).toBe(404);
    const del = await callRoute(memberRoute.DELETE, `/api/workspaces/${a.id}/members/${foreignMember}`, { method: "DELETE", user: a.members.owner, params });
    expect(del.status).toBe(404);
    const [still] = await testDb().select().from(memberships).where(eq(memberships.id, foreignMember));
    expect(still?.role).toBe("engineer");
  });

  it("an owner cannot revoke another workspace's invitation through their own path", async () => {
    const { invitation } = await createInvitation(b.members.owner, b.id, uniqueEmail("kept"), "reviewer");
    const res = await callRoute(invitationRoute.DELETE, `/api/workspaces/${a.id}/invitations/${invitation.id}`, {
      method: "DELETE", user: a.members.owner, params: { workspaceId: a.id, invitationId: invitation.id },
    });
    expect(res.status).toBe(404);
  });

  it("a malformed or unknown workspace id is 404 for everyone", async () => {
    for (const id of ["not-a-uuid", "00000000-0000-4000-8000-000000000000", "'; drop table users; --"]) {
      const res = await callRoute(membersRoute.GET, `/api/workspaces/${encodeURIComponent(id)}/members`, { user: a.members.owner, params: { workspaceId: id } });
      expect(res.status).toBe(404);
    }
  });

  it("the members list of one workspace never contains people of another", async () => {
    const res = await callRoute<{ members: { email: string }[] }>(membersRoute.GET, `/api/workspaces/${a.id}/members`, {
      user: a.members.reviewer, params: { workspaceId: a.id },
    });
    const emails = res.json.members.map((m) => m.email);
    expect(emails).toContain(a.members.engineer.email);
    for (const role of ROLES) expect(emails).not.toContain(b.members[role].email);
  });
});

describe("/api/workspaces (mine)", () => {
  it("lists only the signed-in person's workspaces with their role, and 401 when signed out", async () => {
    const res = await callRoute<{ workspaces: { id: string; role: Role }[] }>(workspacesRoute.GET, "/api/workspaces", { user: a.members.estimator });
    expect(res.status).toBe(200);
    expect(res.json.workspaces).toEqual([expect.objectContaining({ id: a.id, role: "estimator" })]);
    expect((await callRoute(workspacesRoute.GET, "/api/workspaces")).status).toBe(401);
  });

  it("any signed-in person may create a workspace and becomes its owner; a person can belong to several", async () => {
    const person = a.members.reviewer;
    const created = await callRoute<{ workspace: { id: string; role: Role } }>(workspacesRoute.POST, "/api/workspaces", {
      method: "POST", user: person, body: { name: "Reviewer's own practice" },
    });
    expect(created.status).toBe(201);
    expect(created.json.workspace.role).toBe("owner");
    const mine = await callRoute<{ workspaces: { id: string; role: Role }[] }>(workspacesRoute.GET, "/api/workspaces", { user: person });
    expect(mine.json.workspaces.map((w) => [w.id, w.role]).sort()).toEqual(
      [[a.id, "reviewer"], [created.json.workspace.id, "owner"]].sort(),
    );
    expect((await callRoute(workspacesRoute.POST, "/api/workspaces", { method: "POST", body: { name: "Nobody's" } })).status).toBe(401);
  });

  it("refuses a cross-origin write", async () => {
    const res = await callRoute(workspacesRoute.POST, "/api/workspaces", {
      method: "POST", user: a.members.owner, body: { name: "Planted" }, headers: { origin: "https://elsewhere.example" },
    });
    expect(res.status).toBe(403);
  });
});
