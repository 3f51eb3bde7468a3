/**
 * Sessions: route handlers decode the signed next-auth JWT from the request's cookie. A forged,
 * expired or missing cookie is no session; the account routes work only with a real one.
 */
import { afterAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { closeDb, testDb } from "./support/database";
import { buildRequest, callRoute, sessionCookieFor } from "./support/session";
import { createTestUser, createTestWorkspace } from "./support/fixtures";
import { auditLog, users } from "@/db/schema";
import { getSessionUser } from "@/lib/auth/session";
import { authOptions, SESSION_MAX_AGE_SECONDS } from "@/lib/auth/options";
import { GET as accountGet, PATCH as accountPatch } from "@/app/api/auth/account/route";

afterAll(closeDb);

describe("getSessionUser(req)", () => {
  it("reads the user from a signed session cookie and refuses forged, expired and absent ones", async () => {
    const user = await createTestUser("session");
    expect(await getSessionUser(await buildRequest("/api/auth/account", { user }))).toEqual({ id: user.id, email: user.email, name: user.name });
    const forged = await sessionCookieFor(user, { secret: "someone-elses-secret" });
    expect(await getSessionUser(await buildRequest("/api/auth/account", { cookie: forged }))).toBeNull();
    const expired = await sessionCookieFor(user, { maxAgeSeconds: -60 });
    expect(await getSessionUser(await buildRequest("/api/auth/account", { cookie: expired }))).toBeNull();
    expect(await getSessionUser(await buildRequest("/api/auth/account"))).toBeNull();
    expect((await callRoute(accountGet, "/api/auth/account", { cookie: forged })).status).toBe(401);
  });

  it("refuses a session whose user no longer exists or whose password has changed since", async () => {
    const user = await createTestUser("gone");
    const stale = await sessionCookieFor(user, { passwordHash: "$2b$10$an-older-hash-than-the-current-one" });
    expect(await getSessionUser(await buildRequest("/api/auth/account", { cookie: stale }))).toBeNull();
    const live = await sessionCookieFor(user);
    await testDb().delete(users).where(eq(users.id, user.id));
    expect(await getSessionUser(await buildRequest("/api/auth/account", { cookie: live }))).toBeNull();
  });

  it("uses JWT sessions that expire after 12 hours in http-only cookies", () => {
    expect(authOptions.session?.strategy).toBe("jwt");
    expect(SESSION_MAX_AGE_SECONDS).toBe(12 * 3600);
    // next-auth's default session cookie is httpOnly and SameSite=Lax; we never override it to weaker values.
    expect(authOptions.cookies).toBeUndefined();
  });
});

describe("/api/auth/account", () => {
  it("shows the signed-in person and their workspaces, never the password hash", async () => {
    const ws = await createTestWorkspace();
    const res = await callRoute<{ user: Record<string, unknown>; workspaces: { id: string; role: string }[] }>(accountGet, "/api/auth/account", {
      user: ws.members.engineer,
    });
    expect(res.status).toBe(200);
    expect(Object.keys(res.json.user).sort()).toEqual(["email", "id", "name"]);
    expect(res.json.workspaces).toEqual([expect.objectContaining({ id: ws.id, role: "engineer" })]);
    expect(JSON.stringify(res.json)).not.toContain("$2");
  });

  it("renames the person (HTML kept as plain text) and audits before and after", async () => {
    const user = await createTestUser("rename", "Old Name");
    const res = await callRoute<{ user: { name: string } }>(accountPatch, "/api/auth/account", {
      method: "PATCH", user, body: { name: "  <b>New</b> Name  " },
    });
    expect(res.status).toBe(200);
    expect(res.json.user.name).toBe("<b>New</b> Name");
    const [row] = await testDb().select().from(users).where(eq(users.id, user.id));
    expect(row?.name).toBe("<b>New</b> Name");
    const [audit] = await testDb().select().from(auditLog).where(and(eq(auditLog.entityId, user.id), eq(auditLog.action, "update")));
    expect(audit?.before).toMatchObject({ name: "Old Name" });
    expect(audit?.after).toMatchObject({ name: "<b>New</b> Name" });
    expect(audit?.userId).toBe(user.id);
    expect(audit?.at).toBeInstanceOf(Date);
  });

  it("refuses an over-long name with 400", async () => {
    const user = await createTestUser("rename-long");
    const res = await callRoute<{ issues: { path: string }[] }>(accountPatch, "/api/auth/account", { method: "PATCH", user, body: { name: "x".repeat(500) } });
    expect(res.status).toBe(400);
    expect(res.json.issues[0]?.path).toBe("name");
  });
});
