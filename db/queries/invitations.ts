/**
 * Invitations by e-mail. Only the SHA-256 of the link's token is stored; accepting marks the row
 * used inside a transaction that holds its lock, so a link works once and only before it expires.
 */
import { and, eq, isNull } from "drizzle-orm";
import { getDb } from "../client";
import { invitations, memberships, users, workspaces } from "../schema";
import { recordAudit } from "@/lib/audit";
import { conflict, forbidden, HttpError, notFound } from "@/lib/api/errors";
import { createToken, hashToken } from "@/lib/auth/tokens";
import { hashPassword } from "@/lib/auth/password";
import type { Role } from "@/lib/permissions";
import type { SessionUser } from "@/lib/auth/session-user";
import { EMAIL_TAKEN, isUniqueViolation, publicUser } from "./users";

export const INVITATION_TTL_MS = 7 * 24 * 60 * 60 * 1000;

export interface InvitationRow {
  id: string;
  email: string;
  role: Role;
  invitedBy: string | null;
  expiresAt: string;
  expired: boolean;
  createdAt: string;
}

function auditView(inv: { email: string; role: Role; expiresAt: Date }) {
  return { email: inv.email, role: inv.role, expiresAt: inv.expiresAt.toISOString() };
}

/**
 * Creates an invitation (replacing any open one for the same address) and returns the token for the
 * mail. Inviting someone who is already a member is a 409.
 */
export async function createInvitation(actor: SessionUser, workspaceId: string, email: string, role: Role, now = new Date()) {
  const { token, hash } = createToken();
  const invitation = await getDb().transaction(async (tx) => {
    const [existing] = await tx
      .select({ id: memberships.id })
      .from(memberships)
      .innerJoin(users, eq(users.id, memberships.userId))
      .where(and(eq(memberships.workspaceId, workspaceId), eq(users.email, email)));
    if (existing) throw new HttpError(409, "this person is already a member of the workspace", [{ path: "email", message: "already a member of this workspace" }]);
    const replaced = await tx
      .delete(invitations)
      .where(and(eq(invitations.workspaceId, workspaceId), eq(invitations.email, email), isNull(invitations.acceptedAt)))
      .returning();
    for (const old of replaced) {
      await recordAudit({ workspaceId, userId: actor.id, action: "replace", entity: "invitation", entityId: old.id, before: auditView(old), after: null }, tx);
    }
    const [row] = await tx
      .insert(invitations)
      .values({ workspaceId, email, role, tokenHash: hash, invitedBy: actor.id, expiresAt: new Date(now.getTime() + INVITATION_TTL_MS) })
      .returning();
    if (!row) throw new Error("invitation insert returned nothing");
    await recordAudit({ workspaceId, userId: actor.id, action: "create", entity: "invitation", entityId: row.id, after: auditView(row) }, tx);
    return row;
  });
  return { invitation: toRow(invitation, now), token };
}

function toRow(r: typeof invitations.$inferSelect, now = new Date()): InvitationRow {
  return {
    id: r.id,
    email: r.email,
    role: r.role,
    invitedBy: r.invitedBy,
    expiresAt: r.expiresAt.toISOString(),
    expired: r.expiresAt.getTime() <= now.getTime(),
    createdAt: r.createdAt.toISOString(),
  };
}

export async function listOpenInvitations(workspaceId: string): Promise<InvitationRow[]> {
  const rows = await getDb()
    .select()
    .from(invitations)
    .where(and(eq(invitations.workspaceId, workspaceId), isNull(invitations.acceptedAt)))
    .orderBy(invitations.createdAt);
  return rows.map((r) => toRow(r));
}

export async function revokeInvitation(actor: SessionUser, workspaceId: string, invitationId: string) {
  return getDb().transaction(async (tx) => {
    const [row] = await tx
      .delete(invitations)
      .where(and(eq(invitations.id, invitationId), eq(invitations.workspaceId, workspaceId), isNull(invitations.acceptedAt)))
      .returning();
    if (!row) throw notFound("invitation not found");
    await recordAudit({ workspaceId, userId: actor.id, action: "revoke", entity: "invitation", entityId: row.id, before: auditView(row), after: null }, tx);
    return { id: row.id, revoked: true };
  });
}

export type InvitationState = "open" | "expired" | "used";

/** What the acceptance page shows: the workspace, who invited, the role and whether it still works. */
export async function describeInvitation(token: string, now = new Date()) {
  const [row] = await getDb()
    .select({
      id: invitations.id,
      email: invitations.email,
      role: invitations.role,
      expiresAt: invitations.expiresAt,
      acceptedAt: invitations.acceptedAt,
      workspaceId: workspaces.id,
      workspaceName: workspaces.name,
      inviterName: users.name,
    })
    .from(invitations)
    .innerJoin(workspaces, eq(workspaces.id, invitations.workspaceId))
    .leftJoin(users, eq(users.id, invitations.invitedBy))
    .where(eq(invitations.tokenHash, hashToken(token)));
  if (!row) return null;
  const state: InvitationState = row.acceptedAt ? "used" : row.expiresAt.getTime() <= now.getTime() ? "expired" : "open";
  const accountExists = (await getDb().select({ id: users.id }).from(users).where(eq(users.email, row.email))).length > 0;
  return { ...row, state, accountExists };
}

type Tx = Parameters<Parameters<ReturnType<typeof getDb>["transaction"]>[0]>[0];

async function lockOpenInvitation(tx: Tx, token: string, now: Date) {
  const [row] = await tx.select().from(invitations).where(eq(invitations.tokenHash, hashToken(token))).for("update");
  if (!row) throw notFound("this invitation link is not valid; ask for a new one");
  if (row.acceptedAt) throw conflict("this invitation has already been used");
  if (row.expiresAt.getTime() <= now.getTime()) throw new HttpError(410, "this invitation has expired; ask the workspace owner for a new one");
  return row;
}

async function joinWorkspace(tx: Tx, invitation: typeof invitations.$inferSelect, userId: string, now: Date) {
  await tx.update(invitations).set({ acceptedAt: now, updatedAt: now, version: invitation.version + 1 }).where(eq(invitations.id, invitation.id));
  const [created] = await tx
    .insert(memberships)
    .values({ workspaceId: invitation.workspaceId, userId, role: invitation.role })
    .onConflictDoNothing()
    .returning();
  const [membership] = created
    ? [created]
    : await tx.select().from(memberships).where(and(eq(memberships.workspaceId, invitation.workspaceId), eq(memberships.userId, userId)));
  if (!membership) throw new Error("membership missing after accepting");
  await recordAudit(
    { workspaceId: invitation.workspaceId, userId, action: "accept", entity: "invitation", entityId: invitation.id, before: auditView(invitation), after: { ...auditView(invitation), acceptedAt: now.toISOString() } },
    tx,
  );
  if (created) {
    await recordAudit(
      { workspaceId: invitation.workspaceId, userId, action: "create", entity: "membership", entityId: created.id, after: { userId, role: created.role } },
      tx,
    );
  }
  return { workspaceId: invitation.workspaceId, role: membership.role };
}

/** A signed-in person accepts; the invitation must have been sent to their own address. */
export async function acceptInvitation(user: SessionUser, token: string, now = new Date()) {
  return getDb().transaction(async (tx) => {
    const invitation = await lockOpenInvitation(tx, token, now);
    if (invitation.email !== user.email.toLowerCase()) {
      throw forbidden(`this invitation was sent to ${invitation.email}; sign in with that address to accept it`);
    }
    return joinWorkspace(tx, invitation, user.id, now);
  });
}

/**
 * A newcomer accepts by creating an account for the invited address. Receiving the mail proves the
 * address, so the account starts verified.
 */
export async function acceptInvitationAsNewcomer(token: string, name: string, password: string, now = new Date()) {
  const passwordHash = await hashPassword(password);
  try {
    return await getDb().transaction(async (tx) => {
      const invitation = await lockOpenInvitation(tx, token, now);
      const [user] = await tx
        .insert(users)
        .values({ email: invitation.email, name, passwordHash, emailVerified: now })
        .returning();
      if (!user) throw new Error("user insert returned nothing");
      await recordAudit({ workspaceId: null, userId: user.id, action: "create", entity: "user", entityId: user.id, after: publicUser(user) }, tx);
      const joined = await joinWorkspace(tx, invitation, user.id, now);
      return { ...joined, email: user.email };
    });
  } catch (error) {
    if (isUniqueViolation(error)) throw new HttpError(409, EMAIL_TAKEN, [{ path: "email", message: EMAIL_TAKEN }]);
    throw error;
  }
}
