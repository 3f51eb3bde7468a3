/**
 * Column marks of a project. Member data, limits and the current design are jsonb in the engine's
 * contract shape (US units). k is recomputed from ψ on every write where ψ is given.
 */
import { and, asc, count, eq, sql } from "drizzle-orm";
import { getDb, type Database } from "../client";
import { columnMarks, loadCombinations, projects } from "../schema";
import { recordAudit } from "@/lib/audit";
import { conflict, notFound, unprocessable } from "@/lib/api/errors";
import { applyPsi, type MarkCreate, type MarkDesign, type MarkLimits, type MarkMember, type MarkUpdate } from "@/lib/validation/mark";

export interface Mark {
  id: string;
  projectId: string;
  label: string;
  level: string;
  quantity: number;
  member: MarkMember;
  limits: MarkLimits;
  design: MarkDesign;
  createdAt: Date;
  updatedAt: Date;
  version: number;
}

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

export function toMark(row: typeof columnMarks.$inferSelect): Mark {
  return {
    id: row.id,
    projectId: row.projectId,
    label: row.label,
    level: row.level,
    quantity: row.quantity,
    member: row.member as MarkMember,
    limits: row.limits as MarkLimits,
    design: row.design as MarkDesign,
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
    version: row.version,
  };
}

function isUniqueViolation(error: unknown): boolean {
  const e = error as { code?: string; cause?: { code?: string } };
  return e?.code === "23505" || e?.cause?.code === "23505";
}

function duplicateMark(label: string, level: string) {
  return unprocessable(`mark ${label}${level ? ` at level ${level}` : ""} already exists in this project`, [
    { path: "label", message: `${label}${level ? ` (${level})` : ""} is taken: use another label or level` },
  ]);
}

export async function listMarks(projectId: string) {
  const db = getDb();
  const loads = db
    .select({ markId: loadCombinations.markId, loads: count().as("loads") })
    .from(loadCombinations)
    .groupBy(loadCombinations.markId)
    .as("l");
  const rows = await db
    .select({ mark: columnMarks, loads: sql<number>`coalesce(${loads.loads}, 0)::int` })
    .from(columnMarks)
    .leftJoin(loads, eq(loads.markId, columnMarks.id))
    .where(eq(columnMarks.projectId, projectId))
    .orderBy(asc(columnMarks.label), asc(columnMarks.level));
  return rows.map((r) => ({ ...toMark(r.mark), loads: r.loads }));
}

export async function getMark(markId: string): Promise<Mark> {
  const [row] = await getDb().select().from(columnMarks).where(eq(columnMarks.id, markId));
  if (!row) throw notFound("column mark not found");
  return toMark(row);
}

export async function insertMark(tx: Tx, projectId: string, input: MarkCreate): Promise<Mark> {
  const [row] = await tx
    .insert(columnMarks)
    .values({ projectId, label: input.label, level: input.level, quantity: input.quantity, member: applyPsi(input.member), limits: input.limits, design: input.design })
    .returning();
  if (!row) throw new Error("mark insert returned nothing");
  return toMark(row);
}

export async function createMark(projectId: string, input: MarkCreate, userId: string, workspaceId: string): Promise<Mark> {
  try {
    return await getDb().transaction(async (tx) => {
      const mark = await insertMark(tx, projectId, input);
      await recordAudit({ workspaceId, userId, action: "create", entity: "column_mark", entityId: mark.id, after: mark }, tx);
      return mark;
    });
  } catch (error) {
    if (isUniqueViolation(error)) throw duplicateMark(input.label, input.level);
    throw error;
  }
}

/** Many marks at once, in one transaction: all of them or none. */
export async function createMarks(projectId: string, inputs: MarkCreate[], userId: string, workspaceId: string): Promise<Mark[]> {
  try {
    return await getDb().transaction(async (tx) => {
      const out: Mark[] = [];
      for (const input of inputs) out.push(await insertMark(tx, projectId, input));
      await recordAudit({ workspaceId, userId, action: "import", entity: "column_mark", entityId: null, after: out.map((m) => m.id) }, tx);
      return out;
    });
  } catch (error) {
    if (isUniqueViolation(error)) throw unprocessable("one of the marks already exists in this project (same label and level)");
    throw error;
  }
}

export async function updateMark(markId: string, patch: MarkUpdate, userId: string, workspaceId: string): Promise<Mark> {
  const { version, ...changes } = patch;
  try {
    return await getDb().transaction(async (tx) => {
      const [beforeRow] = await tx.select().from(columnMarks).where(eq(columnMarks.id, markId)).for("update");
      if (!beforeRow) throw notFound("column mark not found");
      const before = toMark(beforeRow);
      if (before.version !== version) {
        throw conflict(`mark ${before.label} was changed by someone else (you had version ${version}, it is now ${before.version})`, before);
      }
      const member = changes.member ? applyPsi(changes.member) : undefined;
      const [afterRow] = await tx
        .update(columnMarks)
        .set({ ...changes, ...(member ? { member } : {}), version: before.version + 1, updatedAt: new Date() })
        .where(and(eq(columnMarks.id, markId), eq(columnMarks.version, version)))
        .returning();
      if (!afterRow) throw conflict(`mark ${before.label} was changed by someone else`, before);
      const after = toMark(afterRow);
      await recordAudit({ workspaceId, userId, action: "update", entity: "column_mark", entityId: markId, before, after }, tx);
      return after;
    });
  } catch (error) {
    if (isUniqueViolation(error)) throw duplicateMark(changes.label ?? "", changes.level ?? "");
    throw error;
  }
}

export async function deleteMark(markId: string, version: number, userId: string, workspaceId: string): Promise<void> {
  await getDb().transaction(async (tx) => {
    const [beforeRow] = await tx.select().from(columnMarks).where(eq(columnMarks.id, markId)).for("update");
    if (!beforeRow) throw notFound("column mark not found");
    if (beforeRow.version !== version) throw conflict(`mark ${beforeRow.label} was changed by someone else`, toMark(beforeRow));
    await tx.delete(columnMarks).where(eq(columnMarks.id, markId));
    await recordAudit({ workspaceId, userId, action: "delete", entity: "column_mark", entityId: markId, before: toMark(beforeRow) }, tx);
  });
}

/** Marks of a project by label (and level), for project-wide CSV imports. */
export async function marksByLabel(projectId: string): Promise<Mark[]> {
  const rows = await getDb().select().from(columnMarks).where(eq(columnMarks.projectId, projectId));
  return rows.map(toMark);
}

/** Touch the mark's updatedAt when its loads change (its version stays: loads carry their own). */
export async function bumpMark(tx: Tx, markId: string): Promise<void> {
  await tx.update(columnMarks).set({ updatedAt: new Date() }).where(eq(columnMarks.id, markId));
}

export async function projectOf(markId: string) {
  const [row] = await getDb()
    .select({ project: projects })
    .from(columnMarks)
    .innerJoin(projects, eq(projects.id, columnMarks.projectId))
    .where(eq(columnMarks.id, markId));
  if (!row) throw notFound("column mark not found");
  return row.project;
}
