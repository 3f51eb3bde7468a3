/**
 * Projects of a workspace. Writes are optimistic: the caller passes the version it read and a
 * stale write is refused with 409 carrying the current row, so the user sees what changed.
 */
import { and, asc, count, eq, sql } from "drizzle-orm";
import { getDb } from "../client";
import { columnMarks, priceBooks, projects } from "../schema";
import { recordAudit } from "@/lib/audit";
import { conflict, notFound } from "@/lib/api/errors";
import type { ProjectCreate, ProjectUpdate } from "@/lib/validation/project";
import { DEFAULT_CARBON, DEFAULT_PRICES } from "@/lib/validation/price-book";

export type ProjectRow = typeof projects.$inferSelect;

export async function listProjects(workspaceId: string) {
  const db = getDb();
  const marks = db
    .select({ projectId: columnMarks.projectId, marks: count().as("marks") })
    .from(columnMarks)
    .groupBy(columnMarks.projectId)
    .as("m");
  return db
    .select({
      id: projects.id,
      name: projects.name,
      codeBasis: projects.codeBasis,
      units: projects.units,
      updatedAt: projects.updatedAt,
      version: projects.version,
      marks: sql<number>`coalesce(${marks.marks}, 0)::int`,
    })
    .from(projects)
    .leftJoin(marks, eq(marks.projectId, projects.id))
    .where(eq(projects.workspaceId, workspaceId))
    .orderBy(asc(projects.name));
}

export async function getProject(projectId: string): Promise<ProjectRow> {
  const [row] = await getDb().select().from(projects).where(eq(projects.id, projectId));
  if (!row) throw notFound("project not found");
  return row;
}

/** A new project starts with revision 1 of the default price book, so every result can name one. */
export async function createProject(input: ProjectCreate, userId: string): Promise<ProjectRow> {
  return getDb().transaction(async (tx) => {
    const [row] = await tx.insert(projects).values(input).returning();
    if (!row) throw new Error("project insert returned nothing");
    await tx.insert(priceBooks).values({ projectId: row.id, revision: 1, prices: DEFAULT_PRICES, carbon: DEFAULT_CARBON, createdBy: userId });
    await recordAudit({ workspaceId: row.workspaceId, userId, action: "create", entity: "project", entityId: row.id, after: row }, tx);
    return row;
  });
}

export async function updateProject(projectId: string, patch: ProjectUpdate, userId: string): Promise<ProjectRow> {
  const { version, ...changes } = patch;
  return getDb().transaction(async (tx) => {
    const [before] = await tx.select().from(projects).where(eq(projects.id, projectId)).for("update");
    if (!before) throw notFound("project not found");
    if (before.version !== version) throw conflict(`the project was changed by someone else (you had version ${version}, it is now ${before.version})`, before);
    const [after] = await tx
      .update(projects)
      .set({ ...changes, version: before.version + 1, updatedAt: new Date() })
      .where(and(eq(projects.id, projectId), eq(projects.version, version)))
      .returning();
    if (!after) throw conflict("the project was changed by someone else", before);
    await recordAudit({ workspaceId: after.workspaceId, userId, action: "update", entity: "project", entityId: projectId, before, after }, tx);
    return after;
  });
}

export async function deleteProject(projectId: string, version: number, userId: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    const [before] = await tx.select().from(projects).where(eq(projects.id, projectId)).for("update");
    if (!before) throw notFound("project not found");
    if (before.version !== version) throw conflict(`the project was changed by someone else (you had version ${version}, it is now ${before.version})`, before);
    await tx.delete(projects).where(eq(projects.id, projectId));
    await recordAudit({ workspaceId: before.workspaceId, userId, action: "delete", entity: "project", entityId: projectId, before }, tx);
  });
}
