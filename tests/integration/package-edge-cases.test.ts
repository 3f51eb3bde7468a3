/**
 * Calculation packages for the less common designs, read back as text: a sway column (the
 * sway magnifier δs row), a spiral circular column, and a mark whose stored design is not a
 * valid section (the package still renders and says why). Invented inputs throughout.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb, testDb, uniqueSuffix } from "./support/database";
import { createTestWorkspace } from "./support/fixtures";
import { readPdfText, type PdfPageText } from "./package-pdf-text";
import { columnMarks, loadCombinations, priceBooks, projects } from "@/db/schema";
import { renderProjectPackage } from "@/lib/reports/render-package";
import { buildSchedule, type Schedule } from "@/lib/schedule/build-schedule";
import { CARBON, PRICES } from "./schedule-fixtures";

let pages: PdfPageText[];
let schedule: Schedule | null;

beforeAll(async () => {
  const db = testDb();
  const workspace = await createTestWorkspace();
  const [project] = await db.insert(projects).values({ workspaceId: workspace.id, name: `Kiln Yard Annex ${uniqueSuffix()}` }).returning();
  if (!project) throw new Error("project insert failed");
  await db.insert(priceBooks).values({ projectId: project.id, revision: 1, prices: PRICES, carbon: CARBON });
  const [sway, spiral, broken] = await db
    .insert(columnMarks)
    .values([
      {
        projectId: project.id,
        label: "S-1",
        level: "P1",
        quantity: 3,
        member: { lu: 150, kx: 1.3, ky: 1.3, braced: false, sway: { x: { Q: 0.08 }, y: { Q: 0.08 } } },
        design: { section: { shape: "rect", b: 20, h: 20, fc: 5, fy: 60, confinement: "tied", cover: 1.5, layout: { type: "perimeter", size: "#8", nb: 3, nh: 3 } }, braceLevels: 0 },
      },
      {
        projectId: project.id,
        label: "S-2",
        level: "P1",
        quantity: 2,
        member: { lu: 180, kx: 1, ky: 1, braced: true },
        design: { section: { shape: "circle", D: 22, fc: 5, fy: 60, confinement: "spiral", cover: 1.5, layout: { type: "circle", size: "#8", n: 8 } }, braceLevels: 0, ei: "a" },
      },
      {
        projectId: project.id,
        label: "S-3",
        level: "P2",
        quantity: 1,
        member: { lu: 150, kx: 1, ky: 1, braced: true },
        // bars far outside a 12 in square: not a section the engine accepts
        design: { section: { shape: "rect", b: 12, h: 12, fc: 5, fy: 60, confinement: "tied", cover: 1.5, bars: [{ x: 30, y: 30, size: "#8" }, { x: -30, y: 30, size: "#8" }, { x: 30, y: -30, size: "#8" }, { x: -30, y: -30, size: "#8" }] }, braceLevels: 0 },
      },
    ])
    .returning();
  if (!sway || !spiral || !broken) throw new Error("mark insert failed");
  await db.insert(loadCombinations).values([
    { markId: sway.id, position: 0, name: "1.2D+1.0W", Pu: 300, betaDns: 0.3, Mx: { M1: 150, M2: 300, curvature: "double", M1s: 200, M2s: 350 }, My: null },
    { markId: spiral.id, position: 0, name: "1.2D+1.6L", Pu: 450, betaDns: 0.6, Mx: { M1: 200, M2: 500, curvature: "single" }, My: { M1: 100, M2: 250, curvature: "single" } },
    { markId: broken.id, position: 0, name: "1.4D", Pu: 200, betaDns: 1, Mx: { M1: 0, M2: 100, curvature: "single" }, My: null },
  ]);
  const pdf = await renderProjectPackage(project.id);
  if (!pdf) throw new Error("no package");
  pages = await readPdfText(pdf);
  schedule = await buildSchedule(project.id);
}, 60_000);
afterAll(closeDb);

function markText(label: string): string {
  const start = pages.findIndex((p) => p.items[0] === `Column mark ${label}`);
  if (start < 0) throw new Error(`no page for ${label}`);
  const next = pages.findIndex((p, i) => i > start && /^Column mark /.test(p.items[0] ?? ""));
  return pages.slice(start, next < 0 ? undefined : next).map((p) => p.text).join(" ");
}

describe("packages of uncommon designs", () => {
  it("shows the sway magnifier for a sway column", () => {
    const text = markText("S-1");
    expect(text).toContain("sway, 6.6.4.6");
    expect(text).toContain("delta_s = 1 / (1 - Q) or 1 / (1 - sum Pu / (0.75 sum Pc))");
    // δs = 1/(1 − Q) = 1/(1 − 0.08) = 1.087 (6.6.4.6.2(a), closed form)
    expect(text).toContain("1.087");
    expect(text).toContain("Limit (sway) 22");
  });

  it("describes a spiral circular column with its own EI option", () => {
    const text = markText("S-2");
    expect(text).toContain("circular, D = 22 in");
    expect(text).toContain("spiral");
    expect(text).toContain("(a) EI = 0.4 Ec Ig / (1 + beta_dns) (6.6.4.4.4) — set for this mark");
    expect(text).toContain("Pn,max = 0.85 P0 (Table 22.4.2.1)");
  });

  it("still renders a mark whose stored design is not a valid section, and says why", () => {
    const text = markText("S-3");
    expect(text).toContain("NOT CHECKED.");
    expect(text).toContain("not a valid section");
    for (const h of ["Inputs", "Section", "Interaction diagram", "Moment magnifier", "Detailing checks", "Verdict", "Assumptions"]) expect(text).toContain(h);
  });

  it("schedules the invalid design without quantities and leaves it out of the totals", () => {
    if (!schedule) throw new Error("no schedule");
    const broken = schedule.rows.find((r) => r.label === "S-3");
    expect(broken?.quantities).toBeNull();
    expect(broken?.cost).toBeNull();
    expect(broken?.pass).toBe(false);
    const priced = schedule.rows.filter((r) => r.cost);
    expect(schedule.totals.grand.cost.total).toBeCloseTo(priced.reduce((s, r) => s + (r.cost?.extended.total ?? 0), 0), 6);
    expect(schedule.totals.grand.notPassing).toBeGreaterThanOrEqual(1);
  });
});

describe("a project with more marks than one contents page holds", () => {
  it("runs the contents onto further pages, and every page number still points at its mark", async () => {
    const db = testDb();
    const workspace = await createTestWorkspace();
    const [project] = await db.insert(projects).values({ workspaceId: workspace.id, name: `Long Row Sheds ${uniqueSuffix()}` }).returning();
    if (!project) throw new Error("project insert failed");
    const labels = Array.from({ length: 40 }, (_, i) => `K-${i + 1}`);
    await db.insert(columnMarks).values(
      labels.map((label) => ({
        projectId: project.id,
        label,
        level: "G",
        member: { lu: 120, kx: 1, ky: 1, braced: true },
        design: { section: { shape: "rect", b: 14, h: 14, fc: 4, fy: 60, confinement: "tied", cover: 1.5, layout: { type: "perimeter", size: "#7", nb: 2, nh: 2 } }, braceLevels: 0 },
      })),
    );
    const pdf = await renderProjectPackage(project.id);
    if (!pdf) throw new Error("no package");
    const all = await readPdfText(pdf);
    const contentsPages = all.filter((p) => p.items[0] === "Contents (continued)" || p.items.includes("Contents"));
    expect(contentsPages.length).toBeGreaterThanOrEqual(2);
    const contentsItems = contentsPages.flatMap((p) => p.items);
    for (const label of labels) {
      const at = contentsItems.indexOf(`Column mark ${label}`);
      expect(at).toBeGreaterThanOrEqual(0);
      const start = all.find((p) => p.items[0] === `Column mark ${label}`)?.page;
      expect(contentsItems[at + 5]).toBe(String(start));
    }
    // natural order: K-2 before K-10
    expect(contentsItems.indexOf("Column mark K-2")).toBeLessThan(contentsItems.indexOf("Column mark K-10"));
    const firstMarkPage = all.find((p) => p.items[0] === "Column mark K-1")?.page;
    expect(firstMarkPage).toBe(contentsPages.length + 1);
  }, 120_000);
});
