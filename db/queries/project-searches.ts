/**
 * The latest finished search of every mark of a project, with its stored passing candidates:
 * what project-wide standardization chooses from.
 */
import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { getDb } from "../client";
import { candidates, columnMarks, searches } from "../schema";

export interface MarkWithSearch {
  mark: typeof columnMarks.$inferSelect;
  search: typeof searches.$inferSelect | null;
  candidates: Array<typeof candidates.$inferSelect>;
}

export async function readProjectSearchResults(projectId: string): Promise<MarkWithSearch[]> {
  const db = getDb();
  const marks = await db.select().from(columnMarks).where(eq(columnMarks.projectId, projectId)).orderBy(asc(columnMarks.level), asc(columnMarks.label));
  if (marks.length === 0) return [];
  const done = await db
    .select()
    .from(searches)
    .where(and(inArray(searches.markId, marks.map((m) => m.id)), eq(searches.status, "done")))
    .orderBy(desc(searches.finishedAt));
  const latest = new Map<string, typeof searches.$inferSelect>();
  for (const s of done) if (!latest.has(s.markId)) latest.set(s.markId, s);
  const searchIds = [...latest.values()].map((s) => s.id);
  const rows = searchIds.length > 0 ? await db.select().from(candidates).where(inArray(candidates.searchId, searchIds)) : [];
  const bySearch = new Map<string, Array<typeof candidates.$inferSelect>>();
  for (const row of rows) {
    const list = bySearch.get(row.searchId) ?? [];
    list.push(row);
    bySearch.set(row.searchId, list);
  }
  return marks.map((mark) => {
    const search = latest.get(mark.id) ?? null;
    return { mark, search, candidates: search ? (bySearch.get(search.id) ?? []) : [] };
  });
}
