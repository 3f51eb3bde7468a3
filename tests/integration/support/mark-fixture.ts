/**
 * A project with one column mark, its load combinations and a price book, written straight to the
 * test database. The building, loads and prices are invented test inputs: no outside value is
 * checked against them.
 */
import { getDb } from "@/db/client";
import type { BarSize } from "@/engine/types";
import { columnMarks, loadCombinations, priceBooks, projects } from "@/db/schema";
import { createTestWorkspace, type TestWorkspace } from "./fixtures";

export const TEST_PRICES = {
  concrete: { "4": 185, "5": 196, "6": 210, "8": 242 },
  steel: 1.1,
  formwork: 12.5,
  roundFormwork: 17,
  brace: 2200,
};
export const TEST_CARBON = { concrete: { "4": 255, "5": 285, "6": 318, "8": 372 }, steel: 0.42 };

export interface MarkFixture {
  workspace: TestWorkspace;
  projectId: string;
  markId: string;
  priceBookId: string;
}

/** A tall braced column in single curvature: a 16 in square with 8 #8 that is slender about both axes. */
export async function createSlenderMark(workspace?: TestWorkspace): Promise<MarkFixture> {
  const ws = workspace ?? (await createTestWorkspace());
  const db = getDb();
  const [project] = await db.insert(projects).values({ workspaceId: ws.id, name: "Quarry Lane Depot" }).returning();
  if (!project) throw new Error("project insert failed");
  const [book] = await db
    .insert(priceBooks)
    .values({ projectId: project.id, revision: 1, prices: TEST_PRICES, carbon: TEST_CARBON, formSet: 900 })
    .returning();
  if (!book) throw new Error("price book insert failed");
  const markId = await addMark(project.id, { label: "D-7", level: "Mezzanine", quantity: 3, Pu: 420 });
  return { workspace: ws, projectId: project.id, markId, priceBookId: book.id };
}

/** Adds a mark of the same family (label, level, quantity and governing Pu varied) to a project. */
export async function addMark(projectId: string, m: { label: string; level: string; quantity: number; Pu: number }): Promise<string> {
  const db = getDb();
  const [mark] = await db
    .insert(columnMarks)
    .values({
      projectId,
      label: m.label,
      level: m.level,
      quantity: m.quantity,
      member: { lu: 264, kx: 1, ky: 1, braced: true },
      limits: {},
      design: {
        section: { shape: "rect", b: 16, h: 16, fc: 5, fy: 60, confinement: "tied", cover: 1.5, layout: { type: "perimeter", size: "#8", nb: 3, nh: 3 } },
        braceLevels: 0,
      },
    })
    .returning();
  if (!mark) throw new Error("mark insert failed");
  await db.insert(loadCombinations).values([
    { markId: mark.id, position: 0, name: "1.2D+1.6L", Pu: m.Pu, betaDns: 0.6, Mx: { M1: 500, M2: 900, curvature: "single" } },
    { markId: mark.id, position: 1, name: "1.2D+1.0W+1.0L", Pu: 330, betaDns: 0.4, Mx: { M1: 300, M2: 1100, curvature: "double" }, My: { M1: 0, M2: 250, curvature: "single" } },
  ]);
  return mark.id;
}

/** A small search space so a full search takes well under a second. */
export const SMALL_SPACE = {
  shapes: ["rect"] as Array<"rect" | "circle">,
  b: [14, 22, 2] as [number, number, number],
  h: [14, 22, 2] as [number, number, number],
  fc: [5, 6],
  sizes: ["#8", "#9"] as BarSize[],
  braceLevels: [0, 1],
};
