/**
 * Invitations by e-mail, read back from the real mail catcher: the link works once, expires, is
 * tied to the invited address, and lands the person in the workspace with the invited role.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { closeDb, testDb } from "./support/database";
import { callRoute } from "./support/session";
import { createTestUser, createTestWorkspace, uniqueEmail, type TestWorkspace } from "./support/fixtures";
import { linkFrom, waitForMail } from "./support/mail-catcher";
import { auditLog, invitations, memberships, users } from "@/db/schema";
import { POST as invite, GET as listInvitations } from "@/app/api/workspaces/[workspaceId]/invitations/route";
import { DELETE as revoke } from "@/app/api/workspaces/[workspaceId]/invitations/[invitationId]/route";
import { POST as accept } from "@/app/api/auth/invitations/accept/route";
import { authorizePassword } from "@/lib/auth/credentials";
import { describeInvitation } from "@/db/queries/invitations";
import { hashToken } from "@/lib/auth/tokens";

let ws: TestWorkspace;
beforeAll(async () => {
  ws = await createTestWorkspace(`Halvorsen & <i>Quist</i> ${Date.now()}`);
});
afterAll(closeDb);

interface Issues {
  error: string;
  issues: { path: string; message: string }[];
}

async function inviteAndReadToken(email: string, role: string) {
  const res = await callRoute<{ invitation: { id: string }; mail: { status: string } }>(invite, `/api/workspaces/${ws.id}/invitations`, {
    method: "POST", user: ws.members.owner, params: { workspaceId: ws.id }, body: { email, role },
  });
  expect(res.status).toBe(201);
  const mail = await waitForMail(email, { subject: "Join" });
  const token = linkFrom(mail, "/invitations/accept").searchParams.get("token") ?? "";
  return { invitationId: res.json.invitation.id, token, mail, mailStatus: res.json.mail.status };
}

describe("inviting a newcomer", () => {
  it("mails a link; accepting it creates the account with the invited role; the link then stops working", async () => {
    const email = uniqueEmail("newcomer");
    const { token, mail, mailStatus } = await inviteAndReadToken(email.toUpperCase(), "estimator");
    expect(mailStatus).toBe("sent");
    expect(mail.subject).toContain(ws.name);
    expect(mail.text).toContain("as estimator");
    // Names from people are escaped in the HTML part.
    expect(mail.html).toContain("&lt;i&gt;Quist&lt;/i&gt;");
    expect(mail.html).not.toContain("<i>Quist</i>");

    const described = await describeInvitation(token);
    expect(described).toMatchObject({ email, role: "estimator", state: "open", workspaceId: ws.id, accountExists: false });

    const res = await callRoute<{ workspaceId: string; role: string; email: string }>(accept, "/api/auth/invitations/accept", {
      method: "POST", body: { token, name: "Wren Adeyemi", password: "footing-pier-cap-303" },
    });
    expect(res.status).toBe(200);
    expect(res.json).toEqual({ workspaceId: ws.id, role: "estimator", email });
    const person = await authorizePassword({ email, password: "footing-pier-cap-303" });
    expect(person).toMatchObject({ email, name: "Wren Adeyemi" });
    const [membership] = await testDb().select().from(memberships).where(and(eq(memberships.workspaceId, ws.id), eq(memberships.userId, person?.id ?? "")));
    expect(membership?.role).toBe("estimator");
    const [row] = await testDb().select().from(users).where(eq(users.email, email));
    expect(row?.emailVerified).toBeInstanceOf(Date);

    const again = await callRoute<Issues>(accept, "/api/auth/invitations/accept", { method: "POST", body: { token, name: "Someone", password: "footing-pier-cap-304" } });
    expect(again.status).toBe(409);
    expect(again.json.error).toMatch(/already been used/);
    const signedInAgain = await callRoute<Issues>(accept, "/api/auth/invitations/accept", { method: "POST", user: person, body: { token } });
    expect(signedInAgain.status).toBe(409);

    const audit = await testDb().select().from(auditLog).where(and(eq(auditLog.workspaceId, ws.id), eq(auditLog.entity, "invitation")));
    expect(audit.map((a) => a.action)).toEqual(expect.arrayContaining(["create", "accept"]));
  });

  it("only the token's hash is stored", async () => {
    const email = uniqueEmail("hash");
    const { token, invitationId } = await inviteAndReadToken(email, "reviewer");
    const [row] = await testDb().select().from(invitations).where(eq(invitations.id, invitationId));
    expect(row?.tokenHash).toBe(hashToken(token));
    expect(JSON.stringify(row)).not.toContain(token);
  });

  it("a newcomer needs a strong password and a name (400 on the fields)", async () => {
    const { token } = await inviteAndReadToken(uniqueEmail("weak"), "reviewer");
    const weak = await callRoute<Issues>(accept, "/api/auth/invitations/accept", { method: "POST", body: { token, name: "Tam", password: "password123" } });
    expect(weak.status).toBe(400);
    expect(weak.json.issues[0]?.path).toBe("password");
    const none = await callRoute<Issues>(accept, "/api/auth/invitations/accept", { method: "POST", body: { token } });
    expect(none.status).toBe(400);
    expect(none.json.issues.map((i) => i.path).sort()).toEqual(["name", "password"]);
    expect((await describeInvitation(token))?.state).toBe("open");
  });
});

describe("inviting someone who already has an account", () => {
  it("they accept while signed in and keep their other workspaces", async () => {
    const colleague = await createTestUser("colleague");
    const elsewhere = await createTestWorkspace();
    await testDb().insert(memberships).values({ workspaceId: elsewhere.id, userId: colleague.id, role: "engineer" });
    const { token } = await inviteAndReadToken(colleague.email, "reviewer");
    expect((await describeInvitation(token))?.accountExists).toBe(true);

    const res = await callRoute<{ workspaceId: string; role: string }>(accept, "/api/auth/invitations/accept", { method: "POST", user: colleague, body: { token } });
    expect(res.status).toBe(200);
    expect(res.json).toEqual({ workspaceId: ws.id, role: "reviewer" });
    const rows = await testDb().select().from(memberships).where(eq(memberships.userId, colleague.id));
    expect(rows.map((r) => r.role).sort()).toEqual(["engineer", "reviewer"]);
  });

  it("someone signed in with another address is refused (403) and the invitation stays open", async () => {
    const { token } = await inviteAndReadToken(uniqueEmail("intended"), "engineer");
    const intruder = await createTestUser("intruder");
    const res = await callRoute<Issues>(accept, "/api/auth/invitations/accept", { method: "POST", user: intruder, body: { token } });
    expect(res.status).toBe(403);
    expect(res.json.error).toMatch(/was sent to/);
    expect((await describeInvitation(token))?.state).toBe("open");
  });

  it("a newcomer form for an address that already has an account is a 409", async () => {
    const existing = await createTestUser("has-account");
    const { token } = await inviteAndReadToken(existing.email, "engineer");
    const res = await callRoute<Issues>(accept, "/api/auth/invitations/accept", { method: "POST", body: { token, name: "Pretender", password: "cantilever-deck-run-8" } });
    expect(res.status).toBe(409);
    expect((await describeInvitation(token))?.state).toBe("open");
  });
});

describe("expiry, revocation and replacement", () => {
  it("an expired invitation answers 410 and creates nothing", async () => {
    const email = uniqueEmail("late");
    const { token, invitationId } = await inviteAndReadToken(email, "engineer");
    await testDb().update(invitations).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitations.id, invitationId));
    expect((await describeInvitation(token))?.state).toBe("expired");
    const res = await callRoute<Issues>(accept, "/api/auth/invitations/accept", { method: "POST", body: { token, name: "Late Comer", password: "transfer-girder-66x" } });
    expect(res.status).toBe(410);
    expect(await testDb().select().from(users).where(eq(users.email, email))).toEqual([]);
  });

  it("a revoked invitation's link is not valid (404); listing shows only open ones", async () => {
    const { token, invitationId } = await inviteAndReadToken(uniqueEmail("revoked"), "engineer");
    const del = await callRoute(revoke, `/api/workspaces/${ws.id}/invitations/${invitationId}`, {
      method: "DELETE", user: ws.members.owner, params: { workspaceId: ws.id, invitationId },
    });
    expect(del.status).toBe(200);
    const res = await callRoute<Issues>(accept, "/api/auth/invitations/accept", { method: "POST", body: { token, name: "Too Late", password: "transfer-girder-67y" } });
    expect(res.status).toBe(404);
    const list = await callRoute<{ invitations: { id: string }[] }>(listInvitations, `/api/workspaces/${ws.id}/invitations`, {
      user: ws.members.owner, params: { workspaceId: ws.id },
    });
    expect(list.json.invitations.map((i) => i.id)).not.toContain(invitationId);
  });

  it("inviting the same address again replaces the open invitation; the old link stops working", async () => {
    const email = uniqueEmail("twice");
    const first = await inviteAndReadToken(email, "engineer");
    const second = await callRoute<{ invitation: { id: string } }>(invite, `/api/workspaces/${ws.id}/invitations`, {
      method: "POST", user: ws.members.owner, params: { workspaceId: ws.id }, body: { email, role: "reviewer" },
    });
    expect(second.status).toBe(201);
    expect(await describeInvitation(first.token)).toBeNull();
  });

  it("inviting a current member is a 409 on the email field; a bad address or role is a 400", async () => {
    const member = await callRoute<Issues>(invite, `/api/workspaces/${ws.id}/invitations`, {
      method: "POST", user: ws.members.owner, params: { workspaceId: ws.id }, body: { email: ws.members.engineer.email, role: "reviewer" },
    });
    expect(member.status).toBe(409);
    expect(member.json.issues[0]?.path).toBe("email");
    const bad = await callRoute<Issues>(invite, `/api/workspaces/${ws.id}/invitations`, {
      method: "POST", user: ws.members.owner, params: { workspaceId: ws.id }, body: { email: "two@@firm", role: "admin" },
    });
    expect(bad.status).toBe(400);
    expect(bad.json.issues.map((i) => i.path).sort()).toEqual(["email", "role"]);
  });

  it("a made-up token is 404 and a truncated one 400", async () => {
    expect((await callRoute(accept, "/api/auth/invitations/accept", { method: "POST", body: { token: "y".repeat(43), name: "X Y", password: "transfer-girder-68z" } })).status).toBe(404);
    expect((await callRoute(accept, "/api/auth/invitations/accept", { method: "POST", body: { token: "short" } })).status).toBe(400);
  });
});
