/**
 * Reads everything the schedule and the project package need in a few queries: the project, its
 * marks (ordered by level, then label), their load combinations, the latest price book and each
 * mark's latest approved alternative. Each mark's bundle has the same shape `readMarkInputs`
 * returns, so the live check and the stale fingerprint are exactly those of the single-mark paths.
 */
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { getDb } from "@/db/client";
import { adoptedAlternatives, columnMarks, loadCombinations, priceBooks, projects } from "@/db/schema";
import type { MarkInputs } from "@/db/queries/search-inputs";
import type { AlternativeRow } from "@/db/queries/alternatives";

export interface ProjectMarks {
  project: typeof projects.$inferSelect;
  priceBook: typeof priceBooks.$inferSelect | null;
  marks: Array<{ inputs: MarkInputs; approved: AlternativeRow | null }>;
}

const collator = new Intl.Collator("en", { numeric: true, sensitivity: "base" });

/** Level, then label, in natural order ("L2" before "L10", "C-2" before "C-10"). */
export function compareMarks(a: { level: string; label: string }, b: { level: string; label: string }): number {
  return collator.compare(a.level, b.level) || collator.compare(a.label, b.label);
}

export async function readProjectMarks(projectId: string): Promise<ProjectMarks | null> {
  const db = getDb();
  const [project] = await db.select().from(projects).where(eq(projects.id, projectId));
  if (!project) return null;
  const [priceBook] = await db.select().from(priceBooks).where(eq(priceBooks.projectId, projectId)).orderBy(desc(priceBooks.revision)).limit(1);
  const marks = (await db.select().from(columnMarks).where(eq(columnMarks.projectId, projectId))).sort(compareMarks);
  const ids = marks.map((m) => m.id);
  const loads = ids.length
    ? await db.select().from(loadCombinations).where(inArray(loadCombinations.markId, ids)).orderBy(asc(loadCombinations.position), asc(loadCombinations.createdAt))
    : [];
  const approved = ids.length
    ? await db
        .select()
        .from(adoptedAlternatives)
        .where(and(inArray(adoptedAlternatives.markId, ids), eq(adoptedAlternatives.status, "approved")))
        .orderBy(desc(adoptedAlternatives.decidedAt), desc(adoptedAlternatives.createdAt))
    : [];
  return {
    project,
    priceBook: priceBook ?? null,
    marks: marks.map((mark) => ({
      inputs: { mark, project, loads: loads.filter((l) => l.markId === mark.id), priceBook: priceBook ?? null },
      approved: approved.find((a) => a.markId === mark.id) ?? null,
    })),
  };
}

/** The latest approved alternative of one mark (the one the schedule reports), or null. */
export async function readLatestApproved(markId: string): Promise<AlternativeRow | null> {
  const [row] = await getDb()
    .select()
    .from(adoptedAlternatives)
    .where(and(eq(adoptedAlternatives.markId, markId), eq(adoptedAlternatives.status, "approved")))
    .orderBy(desc(adoptedAlternatives.decidedAt), desc(adoptedAlternatives.createdAt))
    .limit(1);
  return row ?? null;
}
