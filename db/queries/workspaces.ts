import { desc, eq } from "drizzle-orm";
import { getDb } from "../client";
import { auditLog, memberships, users, workspaces } from "../schema";
import { recordAudit } from "@/lib/audit";
import type { SessionUser } from "@/lib/auth/session-user";
import { randomBytes } from "node:crypto";

export { listWorkspacesOf } from "./memberships";

/** A URL-friendly slug from the name plus a random tail, so two firms may share a name. */
export function slugFor(name: string): string {
  const base = name
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 40);
  return `${base || "workspace"}-${randomBytes(3).toString("hex")}`;
}

/** Creates a workspace with its creator as the first owner. */
export async function createWorkspace(actor: SessionUser, name: string) {
  return getDb().transaction(async (tx) => {
    const [workspace] = await tx.insert(workspaces).values({ name, slug: slugFor(name) }).returning();
    if (!workspace) throw new Error("workspace insert returned nothing");
    const [membership] = await tx.insert(memberships).values({ workspaceId: workspace.id, userId: actor.id, role: "owner" }).returning();
    await recordAudit(
      { workspaceId: workspace.id, userId: actor.id, action: "create", entity: "workspace", entityId: workspace.id, after: { name: workspace.name, slug: workspace.slug } },
      tx,
    );
    await recordAudit(
      { workspaceId: workspace.id, userId: actor.id, action: "create", entity: "membership", entityId: membership?.id ?? null, after: { userId: actor.id, role: "owner" } },
      tx,
    );
    return { id: workspace.id, name: workspace.name, slug: workspace.slug, role: "owner" as const };
  });
}

export async function getWorkspace(workspaceId: string) {
  const [row] = await getDb()
    .select({ id: workspaces.id, name: workspaces.name, slug: workspaces.slug, createdAt: workspaces.createdAt })
    .from(workspaces)
    .where(eq(workspaces.id, workspaceId));
  return row ?? null;
}

/** The newest changes in a workspace: who, what, when, before and after. */
export async function listAuditEntries(workspaceId: string, limit = 200) {
  const rows = await getDb()
    .select({
      id: auditLog.id,
      action: auditLog.action,
      entity: auditLog.entity,
      entityId: auditLog.entityId,
      before: auditLog.before,
      after: auditLog.after,
      at: auditLog.at,
      userName: users.name,
      userEmail: users.email,
    })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.userId))
    .where(eq(auditLog.workspaceId, workspaceId))
    .orderBy(desc(auditLog.at))
    .limit(limit);
  return rows.map((r) => ({ ...r, at: r.at.toISOString() }));
}
