/**
 * An invented project for the schedule and calculation-package tests, written straight to the
 * real test database with Drizzle: four column marks on two levels (one with a brace level, one
 * circular, one without load combinations), two price book revisions (the latest must be used)
 * and approved / superseded alternatives. All numbers are invented demo inputs.
 */
import { testDb, uniqueSuffix } from "./support/database";
import { createTestWorkspace, type TestWorkspace } from "./support/fixtures";
import { adoptedAlternatives, columnMarks, loadCombinations, priceBooks, projects } from "@/db/schema";
import { readMarkInputs } from "@/db/queries/search-inputs";
import { fingerprintMark } from "@/lib/search-request";
import type { Prices, CarbonFactors, SectionInput } from "@/engine";

export const OLD_PRICES: Prices = { concrete: { "4": 150, "5": 160, "6": 170 }, steel: 0.9, formwork: 10, roundFormwork: 14, brace: 1500 };
export const PRICES: Prices = { concrete: { "4": 195, "5": 210, "6": 228 }, steel: 1.2, formwork: 14, roundFormwork: 19, brace: 2600 };
export const CARBON: CarbonFactors = { concrete: { "4": 260, "5": 290, "6": 320 }, steel: 0.4 };

export interface FixtureMark {
  id: string;
  label: string;
  level: string;
  quantity: number;
  lu: number;
  section: SectionInput;
  braceLevels: number;
}

export interface ReportFixture {
  workspace: TestWorkspace;
  outsider: TestWorkspace;
  projectId: string;
  projectName: string;
  marks: Record<"c1" | "c2" | "c7" | "c9", FixtureMark>;
}

const rect = (b: number, h: number, size: "#8" | "#9", nb: number, nh: number, fc = 5): SectionInput => ({
  shape: "rect",
  b,
  h,
  fc,
  fy: 60,
  confinement: "tied",
  cover: 1.5,
  layout: { type: "perimeter", size, nb, nh },
});

export async function createReportFixture(): Promise<ReportFixture> {
  const db = testDb();
  const workspace = await createTestWorkspace();
  const outsider = await createTestWorkspace();
  const projectName = `Quarry Lane Depot ${uniqueSuffix()}`;
  const [project] = await db.insert(projects).values({ workspaceId: workspace.id, name: projectName, cover: 1.5, eiOption: "b", dagg: 0.75 }).returning();
  if (!project) throw new Error("project insert failed");
  await db.insert(priceBooks).values({ projectId: project.id, revision: 1, prices: OLD_PRICES, carbon: CARBON });
  await db.insert(priceBooks).values({ projectId: project.id, revision: 2, prices: PRICES, carbon: CARBON });

  const specs: Array<Omit<FixtureMark, "id"> & { key: keyof ReportFixture["marks"]; loads: Array<typeof loadCombinations.$inferInsert> | null }> = [
    {
      key: "c1",
      label: "C-1",
      level: "L1",
      quantity: 4,
      lu: 204,
      section: rect(18, 22, "#8", 3, 3),
      braceLevels: 0,
      loads: [],
    },
    { key: "c2", label: "C-2", level: "L1", quantity: 2, lu: 336, section: rect(16, 16, "#9", 3, 3), braceLevels: 1, loads: [] },
    {
      key: "c7",
      label: "C-7",
      level: "L2",
      quantity: 6,
      lu: 168,
      section: { shape: "circle", D: 20, fc: 6, fy: 60, confinement: "tied", cover: 1.5, layout: { type: "circle", size: "#8", n: 8 } },
      braceLevels: 0,
      loads: [],
    },
    { key: "c9", label: "C-9", level: "L2", quantity: 1, lu: 180, section: rect(16, 16, "#8", 2, 2, 4), braceLevels: 0, loads: null },
  ];
  const marks = {} as ReportFixture["marks"];
  for (const spec of specs) {
    const [mark] = await db
      .insert(columnMarks)
      .values({
        projectId: project.id,
        label: spec.label,
        level: spec.level,
        quantity: spec.quantity,
        member: { lu: spec.lu, kx: 1, ky: 1, braced: true },
        design: { section: spec.section, braceLevels: spec.braceLevels },
      })
      .returning();
    if (!mark) throw new Error("mark insert failed");
    marks[spec.key] = { id: mark.id, label: spec.label, level: spec.level, quantity: spec.quantity, lu: spec.lu, section: spec.section, braceLevels: spec.braceLevels };
  }
  await db.insert(loadCombinations).values([
    { markId: marks.c1.id, position: 0, name: "1.2D+1.6L", Pu: 420, betaDns: 0.6, Mx: { M1: 600, M2: 1300, curvature: "single" }, My: { M1: 0, M2: 150, curvature: "double" } },
    { markId: marks.c1.id, position: 1, name: "1.2D+1.0E", Pu: 260, betaDns: 0.4, Mx: { M1: 900, M2: 1700, curvature: "double" }, My: null },
    // a tall, lightly braced column with a large single-curvature moment: the magnifier matters
    { markId: marks.c2.id, position: 0, name: "1.2D+1.6L", Pu: 380, betaDns: 0.65, Mx: { M1: 700, M2: 1100, curvature: "single" }, My: { M1: 200, M2: 400, curvature: "single" } },
    { markId: marks.c7.id, position: 0, name: "1.4D", Pu: 510, betaDns: 1, Mx: { M1: 150, M2: 300, curvature: "double" }, My: null },
    { markId: marks.c7.id, position: 1, name: "1.2D+1.6L", Pu: 560, betaDns: 0.55, Mx: { M1: 200, M2: 420, curvature: "single" }, My: { M1: 100, M2: 200, curvature: "single" } },
  ]);

  // C-1: an approved alternative checked with today's inputs (current) and an older superseded one.
  const c1Inputs = await readMarkInputs(marks.c1.id);
  if (!c1Inputs) throw new Error("C-1 inputs missing");
  await db.insert(adoptedAlternatives).values([
    { markId: marks.c1.id, candidateId: "r16x20-f5-y60-8#8-p3x3-b0", candidate: {}, status: "superseded", inputsHash: "old", decidedAt: new Date(Date.now() - 86_400_000) },
    { markId: marks.c1.id, candidateId: "r18x22-f5-y60-8#8-p3x3-b0", candidate: {}, status: "approved", inputsHash: fingerprintMark(c1Inputs), decidedAt: new Date() },
  ]);
  // C-7: approved with inputs that have since changed (stale); a newer proposal is not "adopted".
  await db.insert(adoptedAlternatives).values([
    { markId: marks.c7.id, candidateId: "c20-f6-y60-8#8-t-b0", candidate: {}, status: "approved", inputsHash: "inputs-before-the-loads-changed", decidedAt: new Date() },
    { markId: marks.c7.id, candidateId: "c22-f5-y60-8#8-t-b0", candidate: {}, status: "proposed", inputsHash: "x" },
  ]);
  return { workspace, outsider, projectId: project.id, projectName, marks };
}
