/**
 * Access checks for pages and layouts (server components), built on the same helper the route
 * handlers use (lib/authz.ts): signed out → redirect to sign-in and back; not a member → notFound()
 * (the workspace's existence is not confirmed). Role checks stay with the page, so it can say which
 * role is needed instead of a bare error.
 */
import { notFound, redirect } from "next/navigation";
import { authorizeWorkspace, authorizeProject, type WorkspaceAccess } from "@/lib/authz";
import { HttpError } from "@/lib/api/errors";
import { getSessionUser } from "./session";
import type { SessionUser } from "./session-user";

export function signInPath(returnTo: string): string {
  return `/sign-in?callbackUrl=${encodeURIComponent(returnTo)}`;
}

/** The signed-in user, or a redirect to sign-in that comes back to `returnTo`. */
export async function requirePageUser(returnTo: string): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) redirect(signInPath(returnTo));
  return user;
}

async function orNotFound<T>(run: () => Promise<T>): Promise<T> {
  try {
    return await run();
  } catch (error) {
    if (error instanceof HttpError && (error.status === 404 || error.status === 403)) notFound();
    throw error;
  }
}

/** The signed-in member's access to a workspace (any role), or sign-in / 404. */
export async function requireWorkspaceMember(workspaceId: string, returnTo = `/w/${workspaceId}`): Promise<WorkspaceAccess> {
  const user = await requirePageUser(returnTo);
  return orNotFound(() => authorizeWorkspace(user, workspaceId, "read"));
}

/** The same for a project page: a project of another workspace is a 404. */
export async function requireProjectMember(projectId: string, returnTo: string) {
  const user = await requirePageUser(returnTo);
  return orNotFound(() => authorizeProject(user, projectId, "read"));
}
