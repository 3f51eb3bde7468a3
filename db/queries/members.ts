/**
 * Members of a workspace. Role changes and removals lock the workspace row first, so two owners
 * demoting each other at the same moment cannot leave a workspace without an owner.
 */
import { and, count, eq } from "drizzle-orm";
import { getDb } from "../client";
import { memberships, users, workspaces } from "../schema";
import { recordAudit } from "@/lib/audit";
import { conflict, notFound, unprocessable } from "@/lib/api/errors";
import type { Role } from "@/lib/permissions";
import type { SessionUser } from "@/lib/auth/session-user";

export interface MemberRow {
  id: string;
  userId: string;
  email: string;
  name: string;
  role: Role;
  version: number;
  joinedAt: string;
}

export async function listMembers(workspaceId: string): Promise<MemberRow[]> {
  const rows = await getDb()
    .select({
      id: memberships.id,
      userId: users.id,
      email: users.email,
      name: users.name,
      role: memberships.role,
      version: memberships.version,
      joinedAt: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.workspaceId, workspaceId))
    .orderBy(users.name, users.email);
  return rows.map((r) => ({ ...r, joinedAt: r.joinedAt.toISOString() }));
}

export const LAST_OWNER_DEMOTE = "the last owner cannot be demoted; make another member owner first";
export const LAST_OWNER_REMOVE = "the last owner cannot be removed; make another member owner first";

type Tx = Parameters<Parameters<ReturnType<typeof getDb>["transaction"]>[0]>[0];

async function lockMembership(tx: Tx, workspaceId: string, membershipId: string) {
  // Serialises every owner-count decision of this workspace.
  await tx.select({ id: workspaces.id }).from(workspaces).where(eq(workspaces.id, workspaceId)).for("update");
  const [member] = await tx
    .select()
    .from(memberships)
    .where(and(eq(memberships.id, membershipId), eq(memberships.workspaceId, workspaceId)));
  // A membership of another workspace is "not found" here, never "forbidden".
  if (!member) throw notFound("member not found");
  return member;
}

async function ownerCount(tx: Tx, workspaceId: string): Promise<number> {
  const [row] = await tx
    .select({ n: count() })
    .from(memberships)
    .where(and(eq(memberships.workspaceId, workspaceId), eq(memberships.role, "owner")));
  return row?.n ?? 0;
}

export async function changeMemberRole(actor: SessionUser, workspaceId: string, membershipId: string, role: Role, version?: number) {
  return getDb().transaction(async (tx) => {
    const member = await lockMembership(tx, workspaceId, membershipId);
    if (version !== undefined && version !== member.version) {
      throw conflict("this member was changed by someone else; reload to see the current role", { role: member.role, version: member.version });
    }
    if (member.role === role) return { id: member.id, role: member.role, version: member.version };
    if (member.role === "owner" && (await ownerCount(tx, workspaceId)) <= 1) {
      throw unprocessable(LAST_OWNER_DEMOTE, [{ path: "role", message: LAST_OWNER_DEMOTE }]);
    }
    const [after] = await tx
      .update(memberships)
      .set({ role, version: member.version + 1, updatedAt: new Date() })
      .where(eq(memberships.id, member.id))
      .returning();
    if (!after) throw notFound("member not found");
    await recordAudit(
      {
        workspaceId,
        userId: actor.id,
        action: "change-role",
        entity: "membership",
        entityId: member.id,
        before: { userId: member.userId, role: member.role },
        after: { userId: after.userId, role: after.role },
      },
      tx,
    );
    return { id: after.id, role: after.role, version: after.version };
  });
}

export async function removeMember(actor: SessionUser, workspaceId: string, membershipId: string) {
  return getDb().transaction(async (tx) => {
    const member = await lockMembership(tx, workspaceId, membershipId);
    if (member.role === "owner" && (await ownerCount(tx, workspaceId)) <= 1) {
      throw unprocessable(LAST_OWNER_REMOVE);
    }
    await tx.delete(memberships).where(eq(memberships.id, member.id));
    await recordAudit(
      {
        workspaceId,
        userId: actor.id,
        action: "remove",
        entity: "membership",
        entityId: member.id,
        before: { userId: member.userId, role: member.role },
        after: null,
      },
      tx,
    );
    return { id: member.id, removed: true };
  });
}

/** The membership row of this user in this workspace (for "leave workspace"). */
export async function membershipIdOf(userId: string, workspaceId: string): Promise<string | null> {
  const [row] = await getDb()
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.userId, userId), eq(memberships.workspaceId, workspaceId)));
  return row?.id ?? null;
}
