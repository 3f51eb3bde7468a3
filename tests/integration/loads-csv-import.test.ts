/**
 * CSV import of load combinations against the real PostgreSQL: a preview reports every bad
 * cell by row and column; a commit is one transaction (all rows or none) unless the user
 * skips the bad rows explicitly; the original file is kept with the import; a project-wide
 * file fills several marks at once; SI files are converted at the edge.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { callRoute } from "./support/session";
import { closeDb, testDb } from "./support/database";
import { createTestWorkspace, type TestWorkspace } from "./support/fixtures";
import { loadCombinations, loadImports } from "@/db/schema";
import * as markImportRoute from "@/app/api/marks/[markId]/loads/import/route";
import * as projectImportRoute from "@/app/api/projects/[projectId]/loads/import/route";
import * as importFileRoute from "@/app/api/projects/[projectId]/imports/[importId]/route";
import * as loadsRoute from "@/app/api/marks/[markId]/loads/route";
import * as projectRoute from "@/app/api/projects/[projectId]/route";
import { KN_PER_KIP, KNM_PER_KIPIN } from "@/engine/units";
import { createLoadAs, createMarkAs, createProjectAs, loadBody, markBody } from "./projects-support";

let ws: TestWorkspace;
let projectId: string;

beforeAll(async () => {
  ws = await createTestWorkspace();
  projectId = (await createProjectAs(ws.members.owner, ws.id, "Import Project")).id;
});
afterAll(closeDb);

const HEADER = "combination,Pu,Mx_M1,Mx_M2,Mx_curvature,My_M1,My_M2,My_curvature,betaDns";
const GOOD = [
  "1.4D,420,150,300,single,0,60,double,1.0",
  "1.2D+1.6L,510,220,480,single,0,80,double,0.55",
  "1.2D+1.0W+1.0L,380,400,900,double,10,40,double,0.4",
];
// Row 2 has a non-number Pu and M1 > M2 about y.
const BAD_ROW = "1.2D+1.6S,lots,220,480,single,90,80,double,0.5";

type Report = {
  committed: boolean;
  importId: string | null;
  rows: Array<{ row: number; errors: Array<{ row: number; column: string; message: string }> }>;
  rowsWithErrors: number;
  imported: number;
  skipped: number;
};

async function postImport(markId: string, body: Record<string, unknown>) {
  return callRoute<{ report: Report; issues?: Array<{ path: string; message: string }> }>(markImportRoute.POST, `/api/marks/${markId}/loads/import`, {
    method: "POST",
    user: ws.members.engineer,
    params: { markId },
    body: { filename: "frame-run-7.csv", ...body },
  });
}

async function loadsOf(markId: string) {
  return testDb().select().from(loadCombinations).where(eq(loadCombinations.markId, markId));
}

describe("CSV import of one mark's load combinations", () => {
  it("previews without writing and reports the bad row's cells by row and column", async () => {
    const mark = await createMarkAs(ws.members.owner, projectId, markBody("IMP-1"));
    const content = [HEADER, GOOD[0], BAD_ROW, GOOD[1]].join("\n");
    const res = await postImport(mark.id, { content, mode: "preview" });
    expect(res.status).toBe(200);
    expect(res.json.report.committed).toBe(false);
    expect(res.json.report.rowsWithErrors).toBe(1);
    const bad = res.json.report.rows.find((r) => r.row === 2);
    expect(bad?.errors.map((e) => e.column)).toEqual(["Pu"]);
    expect(await loadsOf(mark.id)).toEqual([]);
  });

  it("reports schema errors on the right cell (My_M1 above My_M2)", async () => {
    const mark = await createMarkAs(ws.members.owner, projectId, markBody("IMP-1b"));
    const content = [HEADER, "1.2D+1.6S,500,220,480,single,90,80,double,0.5"].join("\n");
    const res = await postImport(mark.id, { content, mode: "preview" });
    expect(res.json.report.rows[0]?.errors).toEqual([expect.objectContaining({ row: 1, column: "My_M1" })]);
  });

  it("commits nothing when any row is bad (422 with row and column in each issue) and keeps the existing loads", async () => {
    const mark = await createMarkAs(ws.members.owner, projectId, markBody("IMP-2"));
    await createLoadAs(ws.members.owner, mark.id, loadBody("kept", 100));
    const content = [HEADER, GOOD[0], BAD_ROW, GOOD[1]].join("\n");
    const res = await postImport(mark.id, { content, mode: "commit" });
    expect(res.status).toBe(422);
    expect(res.json.issues?.[0]?.path).toBe("rows.2.Pu");
    expect(res.json.issues?.[0]?.message).toMatch(/row 2, Pu/);
    const stored = await loadsOf(mark.id);
    expect(stored.map((l) => l.name)).toEqual(["kept"]);
    expect(await testDb().select().from(loadImports).where(eq(loadImports.markId, mark.id))).toEqual([]);
  });

  it("imports every row of a clean file, replacing the old ones, and keeps the original file", async () => {
    const mark = await createMarkAs(ws.members.owner, projectId, markBody("IMP-3"));
    await createLoadAs(ws.members.owner, mark.id, loadBody("old", 100));
    const content = [HEADER, ...GOOD].join("\r\n") + "\r\n";
    const res = await postImport(mark.id, { content, mode: "commit" });
    expect(res.status).toBe(201);
    expect(res.json.report).toMatchObject({ committed: true, imported: 3, skipped: 0 });
    const stored = (await loadsOf(mark.id)).sort((a, b) => a.position - b.position);
    expect(stored.map((l) => l.name)).toEqual(["1.4D", "1.2D+1.6L", "1.2D+1.0W+1.0L"]);
    expect(stored[2]).toMatchObject({ Pu: 380, betaDns: 0.4, Mx: { M1: 400, M2: 900, curvature: "double" }, My: { M1: 10, M2: 40, curvature: "double" } });
    expect(stored.every((l) => l.importId === res.json.report.importId)).toBe(true);

    const file = await callRoute(importFileRoute.GET, `/api/projects/${projectId}/imports/${res.json.report.importId}`, {
      user: ws.members.reviewer,
      params: { projectId, importId: String(res.json.report.importId) },
    });
    expect(file.status).toBe(200);
    expect(file.response.headers.get("content-type")).toMatch(/text\/csv/);
    // the stored file is byte-for-byte the upload (CRLF line ends included)
    const [row] = await testDb().select().from(loadImports).where(eq(loadImports.id, String(res.json.report.importId)));
    expect(row?.content).toBe(content);
    expect(row?.filename).toBe("frame-run-7.csv");
  });

  it("imports only the good rows when the user explicitly skips the bad ones, and records how many were skipped", async () => {
    const mark = await createMarkAs(ws.members.owner, projectId, markBody("IMP-4"));
    const content = [HEADER, GOOD[0], BAD_ROW, GOOD[1]].join("\n");
    const res = await postImport(mark.id, { content, mode: "commit", skipInvalid: true });
    expect(res.status).toBe(201);
    expect(res.json.report).toMatchObject({ imported: 2, skipped: 1 });
    expect((await loadsOf(mark.id)).map((l) => l.name).sort()).toEqual(["1.2D+1.6L", "1.4D"]);
    const [record] = await testDb().select().from(loadImports).where(eq(loadImports.markId, mark.id));
    expect(record).toMatchObject({ rowsImported: 2, rowsSkipped: 1 });
  });

  it("refuses a file with a missing column or a repeated combination, naming them", async () => {
    const mark = await createMarkAs(ws.members.owner, projectId, markBody("IMP-5"));
    const missing = await postImport(mark.id, { content: "combination,Pu,Mx_M1\nA,1,2", mode: "commit" });
    expect(missing.status).toBe(422);
    expect(missing.json.issues?.map((i) => i.message)).toEqual(expect.arrayContaining(['missing column "Mx_M2"', 'missing column "Mx_curvature"']));
    const repeated = await postImport(mark.id, { content: [HEADER, GOOD[0], GOOD[0]].join("\n"), mode: "preview" });
    expect(repeated.json.report.rows[1]?.errors[0]).toMatchObject({ row: 2, column: "combination" });
  });

  it("refuses sway parts in a braced mark's file on the cell that has them", async () => {
    const mark = await createMarkAs(ws.members.owner, projectId, markBody("IMP-6"));
    const res = await postImport(mark.id, { content: "combination,Pu,Mx_M1,Mx_M2,Mx_curvature,Mx_M2s\nW,100,10,20,double,30", mode: "preview" });
    expect(res.json.report.rows[0]?.errors[0]).toMatchObject({ column: "Mx_M2s" });
  });

  it("is refused to a reviewer on commit (403) but a reviewer may preview", async () => {
    const mark = await createMarkAs(ws.members.owner, projectId, markBody("IMP-7"));
    const body = { filename: "a.csv", content: [HEADER, GOOD[0]].join("\n") };
    const commit = await callRoute(markImportRoute.POST, `/api/marks/${mark.id}/loads/import`, { method: "POST", user: ws.members.reviewer, params: { markId: mark.id }, body: { ...body, mode: "commit" } });
    expect(commit.status).toBe(403);
    const preview = await callRoute(markImportRoute.POST, `/api/marks/${mark.id}/loads/import`, { method: "POST", user: ws.members.reviewer, params: { markId: mark.id }, body: { ...body, mode: "preview" } });
    expect(preview.status).toBe(200);
  });

  it("converts an SI file (kN, kN·m) to kip and kip-in at the edge", async () => {
    const mark = await createMarkAs(ws.members.owner, projectId, markBody("IMP-SI"));
    const res = await postImport(mark.id, { content: "combination,Pu,Mx_M1,Mx_M2,Mx_curvature\nSI-1,1000,50,100,single", mode: "commit", units: "SI" });
    expect(res.status).toBe(201);
    const [stored] = await loadsOf(mark.id);
    // 1 kip = 4.4482216 kN; 1 kip-in = 0.112985 kN·m (exact definitions of the pound-force and the inch)
    expect(stored?.Pu).toBeCloseTo(1000 / KN_PER_KIP, 6);
    expect((stored?.Mx as { M2: number }).M2).toBeCloseTo(100 / KNM_PER_KIPIN, 6);
  });
});

describe("CSV import of many marks' load combinations from one file", () => {
  it("fills each mark named in the file, in one transaction", async () => {
    const p = (await createProjectAs(ws.members.owner, ws.id, "Multi-mark")).id;
    const a = await createMarkAs(ws.members.owner, p, markBody("B-2", "L1"));
    const b = await createMarkAs(ws.members.owner, p, markBody("B-3", "L1"));
    const content = ["mark,level," + HEADER, `B-2,L1,${GOOD[0]}`, `B-2,L1,${GOOD[1]}`, `B-3,L1,${GOOD[0]}`].join("\n");
    const res = await callRoute<{ report: Report }>(projectImportRoute.POST, `/api/projects/${p}/loads/import`, {
      method: "POST",
      user: ws.members.owner,
      params: { projectId: p },
      body: { filename: "all-marks.csv", content, mode: "commit" },
    });
    expect(res.status).toBe(201);
    expect(res.json.report.imported).toBe(3);
    expect((await loadsOf(a.id)).length).toBe(2);
    expect((await loadsOf(b.id)).length).toBe(1);
  });

  it("rolls back every mark when one mark's rows cannot be written (append clash), and reports unknown marks by row", async () => {
    const p = (await createProjectAs(ws.members.owner, ws.id, "Multi-mark 2")).id;
    const a = await createMarkAs(ws.members.owner, p, markBody("D-1", "L1"));
    const b = await createMarkAs(ws.members.owner, p, markBody("D-2", "L1"));
    await createLoadAs(ws.members.owner, b.id, loadBody("1.4D", 100));
    const content = ["mark," + HEADER, `D-1,${GOOD[1]}`, `D-2,${GOOD[0]}`].join("\n");
    const res = await callRoute<{ error: string }>(projectImportRoute.POST, `/api/projects/${p}/loads/import`, {
      method: "POST",
      user: ws.members.owner,
      params: { projectId: p },
      body: { filename: "clash.csv", content, mode: "commit", replace: false },
    });
    expect(res.status).toBe(422);
    expect(await loadsOf(a.id)).toEqual([]);
    expect((await loadsOf(b.id)).map((l) => l.name)).toEqual(["1.4D"]);
    expect(await testDb().select().from(loadImports).where(eq(loadImports.projectId, p))).toEqual([]);

    const unknown = await callRoute<{ report: Report }>(projectImportRoute.POST, `/api/projects/${p}/loads/import`, {
      method: "POST",
      user: ws.members.owner,
      params: { projectId: p },
      body: { filename: "unknown.csv", content: ["mark," + HEADER, `Z-9,${GOOD[0]}`].join("\n"), mode: "preview" },
    });
    expect(unknown.json.report.rows[0]?.errors[0]).toMatchObject({ row: 1, column: "mark" });
  });

  it("reads an SI project's file in SI without being told", async () => {
    const p = await createProjectAs(ws.members.owner, ws.id, "SI project");
    await callRoute(projectRoute.PATCH, `/api/projects/${p.id}`, { method: "PATCH", user: ws.members.owner, params: { projectId: p.id }, body: { version: 1, units: "SI" } });
    const m = await createMarkAs(ws.members.owner, p.id, markBody("S-1", "L1"));
    const res = await callRoute<{ report: Report }>(projectImportRoute.POST, `/api/projects/${p.id}/loads/import`, {
      method: "POST",
      user: ws.members.owner,
      params: { projectId: p.id },
      body: { filename: "si.csv", content: "mark,combination,Pu,Mx_M1,Mx_M2,Mx_curvature\nS-1,U1,4448.2216152605,0,0,single", mode: "commit" },
    });
    expect(res.status).toBe(201);
    const list = await callRoute<{ loads: Array<{ Pu: number }> }>(loadsRoute.GET, `/api/marks/${m.id}/loads`, { user: ws.members.owner, params: { markId: m.id } });
    // 4448.2216152605 kN = 1000 kip exactly (definition of the pound-force)
    expect(list.json.loads[0]?.Pu).toBeCloseTo(1000, 9);
  });
});
