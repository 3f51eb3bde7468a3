/** Names for download file names (the packages themselves read everything else). */
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { columnMarks, projects } from "@/db/schema";

export async function findProjectName(projectId: string): Promise<string | null> {
  const [row] = await getDb().select({ name: projects.name }).from(projects).where(eq(projects.id, projectId));
  return row?.name ?? null;
}

export async function findMarkNames(markId: string): Promise<{ project: string; label: string } | null> {
  const [row] = await getDb()
    .select({ project: projects.name, label: columnMarks.label })
    .from(columnMarks)
    .innerJoin(projects, eq(projects.id, columnMarks.projectId))
    .where(eq(columnMarks.id, markId));
  return row ?? null;
}
