/**
 * Calculation packages read back as text (pdfjs-dist) against the real PostgreSQL: a mark's
 * package carries every heading in order, the magnifier clauses and the engine's own numbers;
 * the project package has a contents page whose page numbers point at each mark's first page,
 * every mark starts on a page of its own, and every page carries the code edition and the
 * caution. Also the routes' authentication and workspace isolation.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "./support/database";
import { callRoute } from "./support/session";
import { createReportFixture, type ReportFixture } from "./schedule-fixtures";
import { readPdfText, type PdfPageText } from "./package-pdf-text";
import { renderMarkPackage, renderProjectPackage } from "@/lib/reports/render-package";
import { MARK_HEADINGS } from "@/lib/reports/write-mark-section";
import { pdfText } from "@/lib/reports/pdf-text";
import { readMarkInputs } from "@/db/queries/search-inputs";
import { buildMarkCheckInput } from "@/lib/mark-check-input";
import { checkMember } from "@/engine";
import { CAUTION } from "@/lib/caution";
import * as projectPackageRoute from "@/app/api/projects/[projectId]/package/route";
import * as markPackageRoute from "@/app/api/marks/[markId]/package/route";

let fx: ReportFixture;
let markPages: PdfPageText[];
let projectPages: PdfPageText[];

beforeAll(async () => {
  fx = await createReportFixture();
  const markPdf = await renderMarkPackage(fx.marks.c1.id);
  const projectPdf = await renderProjectPackage(fx.projectId);
  if (!markPdf || !projectPdf) throw new Error("no package rendered");
  markPages = await readPdfText(markPdf);
  projectPages = await readPdfText(projectPdf);
}, 60_000);
afterAll(closeDb);

const caution = pdfText(CAUTION);

/** Index in `items` of each heading, searched in order; -1 where one is missing. */
function headingPositions(items: string[], headings: readonly string[]): number[] {
  let from = 0;
  return headings.map((h) => {
    const at = items.indexOf(h, from);
    if (at >= 0) from = at + 1;
    return at;
  });
}

describe("renderMarkPackage", () => {
  it("opens with the mark's heading and carries every sub-heading in order", () => {
    expect(markPages[0]?.items[0]).toBe("Column mark C-1");
    const items = markPages.flatMap((p) => p.items);
    const positions = headingPositions(items, MARK_HEADINGS);
    expect(positions.every((p) => p >= 0)).toBe(true);
    expect(MARK_HEADINGS).toEqual(expect.arrayContaining(["Inputs", "Section", "Interaction diagram", "Moment magnifier", "Detailing checks", "Verdict", "Assumptions"]));
  });

  it("puts the code edition, page number and caution on every page", () => {
    expect(markPages.length).toBeGreaterThan(1);
    for (const page of markPages) {
      expect(page.text).toContain("ACI 318-19");
      expect(page.text).toContain(`Page ${page.page} of ${markPages.length}`);
      expect(page.text).toContain(caution);
    }
  });

  it("shows the magnifier chain with its clauses and the engine's own figures", async () => {
    const text = markPages.map((p) => p.text).join(" ");
    // ACI 318-19 clauses of the chain (column-checks.md §3, from memory)
    for (const clause of ["6.2.5.1", "6.6.4.4.4", "6.6.4.4.2", "6.6.4.5.3", "6.6.4.5.2", "6.6.4.5.4", "6.6.4.5.1", "6.2.5.3"]) expect(text).toContain(clause);
    for (const step of ["k l_u / r", "Pc = pi² EI / (k l_u)² (kip)", "delta = Cm / (1 - Pu / (0.75 Pc)) >= 1.0", "Mc = delta M2 (kip-in)", "Mc / M2 <= 1.4 (second-order cap)"]) expect(text).toContain(step);
    const inputs = await readMarkInputs(fx.marks.c1.id);
    if (!inputs) throw new Error("inputs");
    const direct = checkMember(buildMarkCheckInput(inputs, { section: fx.marks.c1.section, braceLevels: 0 }));
    const u = direct.utilization ?? NaN;
    expect(text).toContain(`utilization ${u.toFixed(3).replace(/0+$/, "")}`);
    const first = direct.cases[0];
    if (!first) throw new Error("no case");
    // k ℓu/r about y, printed to one decimal as the engine computed it
    expect(text).toContain(first.y.klur.toFixed(1));
    expect(text).toContain(direct.pass ? "PASSES." : "FAILS.");
  });

  it("spells symbols out: no replacement marks, Greek written as words", () => {
    const text = markPages.map((p) => p.text).join(" ");
    expect(text).not.toMatch(/[φδψβℓρ≤≥√π]/);
    expect(text).not.toContain("?");
    for (const word of ["phiMn", "beta_dns", "l_u", "delta"]) expect(text).toContain(word);
  });

  it("lists the detailing checks with their clauses and names the adopted alternative", () => {
    const text = markPages.map((p) => p.text).join(" ");
    for (const clause of ["10.6.1.1", "10.7.3.1", "25.2.3", "25.7.2.1", "25.7.2.2"]) expect(text).toContain(clause);
    expect(text).toContain("Adopted alternative: r18x22-f5-y60-8#8-p3x3-b0");
    expect(text).toContain("current");
  });

  it("returns null for an unknown mark", async () => {
    expect(await renderMarkPackage("00000000-0000-4000-8000-000000000000")).toBeNull();
  });
});

describe("renderProjectPackage", () => {
  const labels = ["C-1", "C-2", "C-7", "C-9"];

  it("starts every mark on a page of its own, with all its headings before the next mark", () => {
    const starts = labels.map((label) => projectPages.filter((p) => p.items[0] === `Column mark ${label}`).map((p) => p.page));
    for (const s of starts) expect(s).toHaveLength(1);
    const first = starts.map((s) => s[0] ?? -1);
    expect([...first].sort((a, b) => a - b)).toEqual(first);
    expect(first[0]).toBe(2);
    // no page after the contents holds two marks' headings
    for (const page of projectPages.slice(1)) expect(page.items.filter((i) => /^Column mark /.test(i)).length).toBeLessThanOrEqual(1);
    first.forEach((start, k) => {
      const end = (first[k + 1] ?? projectPages.length + 1) - 1;
      const items = projectPages.filter((p) => p.page >= start && p.page <= end).flatMap((p) => p.items);
      expect(headingPositions(items, MARK_HEADINGS).every((p) => p >= 0)).toBe(true);
    });
  });

  it("has a contents page whose page numbers point at each mark's first page", () => {
    const contents = projectPages[0];
    if (!contents) throw new Error("no pages");
    expect(contents.items).toContain("Contents");
    for (const label of labels) {
      const at = contents.items.indexOf(`Column mark ${label}`);
      expect(at).toBeGreaterThan(0);
      const start = projectPages.find((p) => p.items[0] === `Column mark ${label}`)?.page;
      // the row reads: mark, level, quantity, design, verdict, page
      expect(contents.items.slice(at, at + 6)[5]).toBe(String(start));
    }
    const c7Row = contents.items.indexOf("Column mark C-7");
    expect(contents.items.slice(c7Row, c7Row + 6)).toEqual(["Column mark C-7", "L2", "6", "20 in dia., 8 #8, f'c 6 ksi, fy 60 ksi, tied, no brace", "FAILS", expect.any(String)]);
    expect(contents.items).toContain("not checked");
  });

  it("says so when a mark has no load combinations, and carries the caution on every page", () => {
    const c9Start = projectPages.find((p) => p.items[0] === "Column mark C-9")?.page ?? -1;
    const c9Text = projectPages.filter((p) => p.page >= c9Start).map((p) => p.text).join(" ");
    expect(c9Text).toContain("NOT CHECKED.");
    expect(c9Text).toContain("no load combinations");
    for (const page of projectPages) {
      expect(page.text).toContain(caution);
      expect(page.text).toContain(`Page ${page.page} of ${projectPages.length}`);
    }
    const c7Start = projectPages.find((p) => p.items[0] === "Column mark C-7")?.page ?? -1;
    const c7Text = projectPages.filter((p) => p.page >= c7Start && p.page < c9Start).map((p) => p.text).join(" ");
    expect(c7Text).toContain("STALE");
  });
});

describe("package routes", () => {
  it("GET /api/projects/[projectId]/package: 401 anonymous, 404 outsider, PDF for a reviewer", async () => {
    const path = `/api/projects/${fx.projectId}/package`;
    const params = { projectId: fx.projectId };
    expect((await callRoute(projectPackageRoute.GET, path, { params })).status).toBe(401);
    expect((await callRoute(projectPackageRoute.GET, path, { params, user: fx.outsider.members.owner })).status).toBe(404);
    const res = await callRoute(projectPackageRoute.GET, path, { params, user: fx.workspace.members.reviewer });
    expect(res.status).toBe(200);
    expect(res.response.headers.get("content-type")).toBe("application/pdf");
    expect(res.response.headers.get("content-disposition")).toMatch(/^attachment; filename="Quarry-Lane-Depot-.*-calculation-package\.pdf"$/);
    const unknown = "00000000-0000-4000-8000-000000000000";
    expect((await callRoute(projectPackageRoute.GET, `/api/projects/${unknown}/package`, { params: { projectId: unknown }, user: fx.workspace.members.owner })).status).toBe(404);
  });

  it("GET /api/marks/[markId]/package: 401 anonymous, 404 outsider, a PDF that reads back for a member", async () => {
    const markId = fx.marks.c7.id;
    const path = `/api/marks/${markId}/package`;
    expect((await callRoute(markPackageRoute.GET, path, { params: { markId } })).status).toBe(401);
    expect((await callRoute(markPackageRoute.GET, path, { params: { markId }, user: fx.outsider.members.engineer })).status).toBe(404);
    const req = await import("./support/session").then((m) => m.buildRequest(path, { user: fx.workspace.members.estimator }));
    const response = await markPackageRoute.GET(req, { params: Promise.resolve({ markId }) });
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("application/pdf");
    const bytes = Buffer.from(await response.arrayBuffer());
    expect(bytes.subarray(0, 5).toString("latin1")).toBe("%PDF-");
    const pages = await readPdfText(bytes);
    expect(pages[0]?.items[0]).toBe("Column mark C-7");
  });
});
