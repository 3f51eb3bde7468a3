/**
 * Role changes and removals: owners only, the last owner can be neither demoted nor removed (also
 * when two owners demote each other at the same moment), stale versions are refused, and every
 * change leaves an audit row with before and after.
 */
import { afterAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { closeDb, testDb } from "./support/database";
import { callRoute } from "./support/session";
import { createTestWorkspace, type TestWorkspace } from "./support/fixtures";
import { auditLog, memberships } from "@/db/schema";
import { PATCH as changeRole, DELETE as removeRoute } from "@/app/api/workspaces/[workspaceId]/members/[memberId]/route";
import { GET as listMembersRoute } from "@/app/api/workspaces/[workspaceId]/members/route";
import type { MemberRow } from "@/db/queries/members";
import type { TestUser } from "./support/fixtures";

afterAll(closeDb);

async function memberIdOf(ws: TestWorkspace, user: TestUser): Promise<string> {
  const [row] = await testDb().select().from(memberships).where(and(eq(memberships.workspaceId, ws.id), eq(memberships.userId, user.id)));
  if (!row) throw new Error("no membership");
  return row.id;
}

const patch = (ws: TestWorkspace, actor: TestUser, memberId: string, body: unknown) =>
  callRoute<{ member?: MemberRow; error?: string; issues?: { path: string; message: string }[] }>(changeRole, `/api/workspaces/${ws.id}/members/${memberId}`, {
    method: "PATCH", user: actor, params: { workspaceId: ws.id, memberId }, body,
  });
const remove = (ws: TestWorkspace, actor: TestUser, memberId: string) =>
  callRoute<{ error?: string }>(removeRoute, `/api/workspaces/${ws.id}/members/${memberId}`, { method: "DELETE", user: actor, params: { workspaceId: ws.id, memberId } });

describe("the last owner", () => {
  it("cannot demote or remove themselves (422), but can once a second owner exists", async () => {
    const ws = await createTestWorkspace();
    const ownerId = await memberIdOf(ws, ws.members.owner);
    const demote = await patch(ws, ws.members.owner, ownerId, { role: "engineer" });
    expect(demote.status).toBe(422);
    expect(demote.json.error).toMatch(/last owner cannot be demoted/);
    const leave = await remove(ws, ws.members.owner, ownerId);
    expect(leave.status).toBe(422);
    expect(leave.json.error).toMatch(/last owner cannot be removed/);

    const engineerId = await memberIdOf(ws, ws.members.engineer);
    expect((await patch(ws, ws.members.owner, engineerId, { role: "owner" })).status).toBe(200);
    const nowDemote = await patch(ws, ws.members.owner, ownerId, { role: "engineer" });
    expect(nowDemote.status).toBe(200);
    expect(nowDemote.json.member?.role).toBe("engineer");
    // The former owner has lost the power to manage members.
    expect((await patch(ws, ws.members.owner, engineerId, { role: "reviewer" })).status).toBe(403);
  });

  it("two owners demoting each other at the same moment leave exactly one owner", async () => {
    const ws = await createTestWorkspace();
    const ownerId = await memberIdOf(ws, ws.members.owner);
    const engineerId = await memberIdOf(ws, ws.members.engineer);
    await patch(ws, ws.members.owner, engineerId, { role: "owner" });
    const results = await Promise.all([
      patch(ws, ws.members.owner, engineerId, { role: "reviewer" }),
      patch(ws, ws.members.engineer, ownerId, { role: "reviewer" }),
    ]);
    const owners = await testDb().select().from(memberships).where(and(eq(memberships.workspaceId, ws.id), eq(memberships.role, "owner")));
    expect(owners).toHaveLength(1);
    expect(results.map((r) => r.status).sort()).toEqual([200, expect.any(Number)]);
    expect(results.filter((r) => r.status === 200)).toHaveLength(1);
  });
});

describe("role changes", () => {
  it("records who changed what, when, before and after", async () => {
    const ws = await createTestWorkspace();
    const reviewerId = await memberIdOf(ws, ws.members.reviewer);
    const started = new Date(Date.now() - 1000);
    const res = await patch(ws, ws.members.owner, reviewerId, { role: "estimator" });
    expect(res.status).toBe(200);
    const [audit] = await testDb().select().from(auditLog).where(and(eq(auditLog.entityId, reviewerId), eq(auditLog.action, "change-role")));
    expect(audit).toMatchObject({
      workspaceId: ws.id,
      userId: ws.members.owner.id,
      entity: "membership",
      before: { userId: ws.members.reviewer.id, role: "reviewer" },
      after: { userId: ws.members.reviewer.id, role: "estimator" },
    });
    expect(audit?.at.getTime()).toBeGreaterThan(started.getTime());
  });

  it("refuses a stale version with 409 and the current role, and an unknown role with 400", async () => {
    const ws = await createTestWorkspace();
    const list = await callRoute<{ members: MemberRow[] }>(listMembersRoute, `/api/workspaces/${ws.id}/members`, { user: ws.members.owner, params: { workspaceId: ws.id } });
    const estimator = list.json.members.find((m) => m.userId === ws.members.estimator.id);
    if (!estimator) throw new Error("estimator not listed");
    expect((await patch(ws, ws.members.owner, estimator.id, { role: "engineer", version: estimator.version })).status).toBe(200);
    const stale = await patch(ws, ws.members.owner, estimator.id, { role: "reviewer", version: estimator.version });
    expect(stale.status).toBe(409);
    const unknown = await patch(ws, ws.members.owner, estimator.id, { role: "superuser" });
    expect(unknown.status).toBe(400);
    expect(unknown.json.issues?.[0]?.path).toBe("role");
  });
});

describe("removal", () => {
  it("owners remove members (audited); the removed person then gets 404 for the workspace", async () => {
    const ws = await createTestWorkspace();
    const engineerId = await memberIdOf(ws, ws.members.engineer);
    expect((await remove(ws, ws.members.owner, engineerId)).status).toBe(200);
    const after = await callRoute(listMembersRoute, `/api/workspaces/${ws.id}/members`, { user: ws.members.engineer, params: { workspaceId: ws.id } });
    expect(after.status).toBe(404);
    const [audit] = await testDb().select().from(auditLog).where(and(eq(auditLog.entityId, engineerId), eq(auditLog.action, "remove")));
    expect(audit?.before).toEqual({ userId: ws.members.engineer.id, role: "engineer" });
    expect(audit?.after).toBeNull();
  });

  it("any member may leave, but not remove others (403)", async () => {
    const ws = await createTestWorkspace();
    const estimatorId = await memberIdOf(ws, ws.members.estimator);
    const reviewerId = await memberIdOf(ws, ws.members.reviewer);
    expect((await remove(ws, ws.members.reviewer, estimatorId)).status).toBe(403);
    expect((await remove(ws, ws.members.reviewer, reviewerId)).status).toBe(200);
  });
});
