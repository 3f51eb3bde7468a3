/**
 * Everything a search of one mark depends on, read in one place: the mark's member data and
 * limits, its load combinations, the project's design settings and the latest price book.
 * The same reader feeds a new search and the staleness check of adopted alternatives.
 */
import { asc, desc, eq } from "drizzle-orm";
import { getDb } from "../client";
import { notFound } from "@/lib/api/errors";
import { columnMarks, loadCombinations, priceBooks, projects } from "../schema";

export interface MarkInputs {
  mark: typeof columnMarks.$inferSelect;
  project: typeof projects.$inferSelect;
  loads: Array<typeof loadCombinations.$inferSelect>;
  priceBook: typeof priceBooks.$inferSelect | null;
}

export async function readMarkInputs(markId: string): Promise<MarkInputs | null> {
  const db = getDb();
  const [row] = await db
    .select({ mark: columnMarks, project: projects })
    .from(columnMarks)
    .innerJoin(projects, eq(projects.id, columnMarks.projectId))
    .where(eq(columnMarks.id, markId));
  if (!row) return null;
  const loads = await db
    .select()
    .from(loadCombinations)
    .where(eq(loadCombinations.markId, markId))
    .orderBy(asc(loadCombinations.position), asc(loadCombinations.createdAt));
  const [priceBook] = await db
    .select()
    .from(priceBooks)
    .where(eq(priceBooks.projectId, row.project.id))
    .orderBy(desc(priceBooks.revision))
    .limit(1);
  return { mark: row.mark, project: row.project, loads, priceBook: priceBook ?? null };
}

/** As readMarkInputs, for routes that have already authorized the mark: a vanished mark is a 404. */
export async function requireMarkInputs(markId: string): Promise<MarkInputs> {
  const inputs = await readMarkInputs(markId);
  if (!inputs) throw notFound("column mark not found");
  return inputs;
}
