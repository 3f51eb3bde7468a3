/**
 * Every CSV import keeps its original file (name and text) with the counts of rows imported and
 * skipped, so any stored load combination can be traced back to the file it came from.
 */
import { and, desc, eq } from "drizzle-orm";
import { getDb, type Database } from "../client";
import { loadImports, users } from "../schema";
import { notFound } from "@/lib/api/errors";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

export type LoadImportKind = "mark-loads" | "project-loads" | "marks";

export async function insertLoadImport(
  tx: Tx,
  values: { projectId: string; markId: string | null; kind: LoadImportKind; filename: string; content: string; rowsImported: number; rowsSkipped: number; createdBy: string },
) {
  const [row] = await tx.insert(loadImports).values(values).returning();
  if (!row) throw new Error("import insert returned nothing");
  return row;
}

export async function setImportedCount(tx: Tx, importId: string, rowsImported: number): Promise<void> {
  await tx.update(loadImports).set({ rowsImported }).where(eq(loadImports.id, importId));
}

/** Imports of a project (newest first), without the file text. */
export async function listLoadImports(projectId: string, markId?: string) {
  const where = markId ? and(eq(loadImports.projectId, projectId), eq(loadImports.markId, markId)) : eq(loadImports.projectId, projectId);
  return getDb()
    .select({
      id: loadImports.id,
      markId: loadImports.markId,
      kind: loadImports.kind,
      filename: loadImports.filename,
      rowsImported: loadImports.rowsImported,
      rowsSkipped: loadImports.rowsSkipped,
      createdAt: loadImports.createdAt,
      createdBy: users.name,
    })
    .from(loadImports)
    .leftJoin(users, eq(users.id, loadImports.createdBy))
    .where(where)
    .orderBy(desc(loadImports.createdAt));
}

export async function getLoadImport(projectId: string, importId: string) {
  const [row] = await getDb().select().from(loadImports).where(and(eq(loadImports.id, importId), eq(loadImports.projectId, projectId)));
  if (!row) throw notFound("import not found");
  return row;
}
