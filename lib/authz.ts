/**
 * The one authorization helper: every route handler and server action goes through these. A user
 * who is not a member of the workspace gets 404 (the resource's existence is not confirmed); a member
 * whose role lacks the permission gets 403.
 */
import { findMembership, workspaceOfMark, workspaceOfProject } from "@/db/queries/memberships";
import { HttpError, forbidden, notFound, unauthenticated } from "./api/errors";
import { roleAllows, type Permission, type Role } from "./permissions";
import type { SessionUser } from "./auth/session-user";

export interface WorkspaceAccess {
  user: SessionUser;
  workspaceId: string;
  role: Role;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function requireUser(user: SessionUser | null): SessionUser {
  if (!user) throw unauthenticated();
  return user;
}

export async function authorizeWorkspace(
  user: SessionUser | null,
  workspaceId: string,
  permission: Permission,
): Promise<WorkspaceAccess> {
  const signedIn = requireUser(user);
  if (!UUID.test(workspaceId)) throw notFound("workspace not found");
  const membership = await findMembership(signedIn.id, workspaceId);
  if (!membership) throw notFound("workspace not found");
  if (!roleAllows(membership.role, permission)) throw forbidden(`the ${membership.role} role may not ${describe(permission)}`);
  return { user: signedIn, workspaceId, role: membership.role };
}

export async function authorizeProject(
  user: SessionUser | null,
  projectId: string,
  permission: Permission,
): Promise<WorkspaceAccess & { projectId: string }> {
  const signedIn = requireUser(user);
  const workspaceId = UUID.test(projectId) ? await workspaceOfProject(projectId) : null;
  if (!workspaceId) throw notFound("project not found");
  const membership = await findMembership(signedIn.id, workspaceId);
  if (!membership) throw notFound("project not found");
  if (!roleAllows(membership.role, permission)) throw forbidden(`the ${membership.role} role may not ${describe(permission)}`);
  return { user: signedIn, workspaceId, role: membership.role, projectId };
}

export async function authorizeMark(
  user: SessionUser | null,
  markId: string,
  permission: Permission,
): Promise<WorkspaceAccess & { projectId: string; markId: string }> {
  const signedIn = requireUser(user);
  const owner = UUID.test(markId) ? await workspaceOfMark(markId) : null;
  if (!owner) throw notFound("column mark not found");
  const membership = await findMembership(signedIn.id, owner.workspaceId);
  if (!membership) throw notFound("column mark not found");
  if (!roleAllows(membership.role, permission)) throw forbidden(`the ${membership.role} role may not ${describe(permission)}`);
  return { user: signedIn, workspaceId: owner.workspaceId, role: membership.role, projectId: owner.projectId, markId };
}

function describe(permission: Permission): string {
  return permission.replace(/[A-Z]/g, (c) => ` ${c.toLowerCase()}`);
}

/**
 * For rows that belong to a mark (searches, alternatives): reachable exactly when the mark is,
 * with the same 404 for unknown and foreign rows.
 */
export async function authorizeMarkChild<T extends { markId: string }>(
  user: SessionUser | null,
  id: string,
  load: (id: string) => Promise<T | null>,
  permission: Permission,
  what: string,
): Promise<WorkspaceAccess & { projectId: string; markId: string; item: T }> {
  requireUser(user);
  const item = UUID.test(id) ? await load(id) : null;
  if (!item) throw notFound(`${what} not found`);
  try {
    return { ...(await authorizeMark(user, item.markId, permission)), item };
  } catch (error) {
    if (error instanceof HttpError && error.status === 404) throw notFound(`${what} not found`);
    throw error;
  }
}
