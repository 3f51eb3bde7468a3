/**
 * Seeds the invented demo building (scripts/demo-building-data.ts) into the demo workspace:
 * the project, its price book and its column marks with their load combinations. Idempotent:
 * when the workspace already has the project, nothing is written.
 */
import { and, eq } from "drizzle-orm";
import type { Database } from "../db/client";
import { columnMarks, loadCombinations, priceBooks, projects } from "../db/schema";
import { applyPsi, markCreateSchema } from "../lib/validation/mark";
import { loadCaseSchema } from "../lib/validation/load-case";
import { DEMO_MARKS, DEMO_PRICE_BOOK, DEMO_PROJECT } from "./demo-building-data";

export async function seedDemoBuilding(db: Database, workspaceId: string, userId: string | null): Promise<"created" | "present"> {
  const [existing] = await db
    .select({ id: projects.id })
    .from(projects)
    .where(and(eq(projects.workspaceId, workspaceId), eq(projects.name, DEMO_PROJECT.name)));
  if (existing) return "present";
  await db.transaction(async (tx) => {
    const [project] = await tx.insert(projects).values({ ...DEMO_PROJECT, workspaceId }).returning();
    if (!project) throw new Error("demo project insert returned nothing");
    await tx.insert(priceBooks).values({ projectId: project.id, revision: 1, ...DEMO_PRICE_BOOK, createdBy: userId });
    for (const demo of DEMO_MARKS) {
      // The same schemas as the API: demo data that the app would refuse is a bug in the demo.
      const mark = markCreateSchema.parse(demo.mark);
      const [row] = await tx
        .insert(columnMarks)
        .values({ projectId: project.id, label: mark.label, level: mark.level, quantity: mark.quantity, member: applyPsi(mark.member), limits: mark.limits, design: mark.design })
        .returning();
      if (!row) throw new Error(`demo mark ${mark.label} insert returned nothing`);
      await tx.insert(loadCombinations).values(
        demo.loads.map((l, position) => {
          const load = loadCaseSchema.parse(l);
          return { markId: row.id, position, name: load.name, Pu: load.Pu, betaDns: load.betaDns, Mx: load.Mx, My: load.My ?? null };
        }),
      );
    }
  });
  return "created";
}
