import { and, eq } from "drizzle-orm";
import { getDb } from "../client";
import { memberships, projects, columnMarks, workspaces } from "../schema";
import type { Role } from "@/lib/permissions";

export async function findMembership(userId: string, workspaceId: string): Promise<{ role: Role } | null> {
  const [row] = await getDb()
    .select({ role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.userId, userId), eq(memberships.workspaceId, workspaceId)));
  return row ?? null;
}

export async function listWorkspacesOf(userId: string) {
  return getDb()
    .select({ id: workspaces.id, name: workspaces.name, slug: workspaces.slug, role: memberships.role })
    .from(memberships)
    .innerJoin(workspaces, eq(workspaces.id, memberships.workspaceId))
    .where(eq(memberships.userId, userId))
    .orderBy(workspaces.name);
}

/** The workspace a project belongs to, or null when there is no such project. */
export async function workspaceOfProject(projectId: string): Promise<string | null> {
  const [row] = await getDb().select({ workspaceId: projects.workspaceId }).from(projects).where(eq(projects.id, projectId));
  return row?.workspaceId ?? null;
}

/** The workspace and project a column mark belongs to, or null. */
export async function workspaceOfMark(markId: string): Promise<{ workspaceId: string; projectId: string } | null> {
  const [row] = await getDb()
    .select({ workspaceId: projects.workspaceId, projectId: projects.id })
    .from(columnMarks)
    .innerJoin(projects, eq(projects.id, columnMarks.projectId))
    .where(eq(columnMarks.id, markId));
  return row ?? null;
}
