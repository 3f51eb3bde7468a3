/**
 * CSV import of many column marks at once against the real PostgreSQL: errors by row and column,
 * all-or-nothing unless bad rows are skipped explicitly, existing marks refused, SI lengths and
 * strengths converted at the edge, the file kept with the import.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { callRoute } from "./support/session";
import { closeDb, testDb } from "./support/database";
import { createTestWorkspace, type TestWorkspace } from "./support/fixtures";
import { columnMarks, loadImports } from "@/db/schema";
import * as importRoute from "@/app/api/projects/[projectId]/marks/import/route";
import * as projectRoute from "@/app/api/projects/[projectId]/route";
import { MM_PER_IN, MPA_PER_KSI } from "@/engine/units";
import { createMarkAs, createProjectAs, markBody } from "./projects-support";

let ws: TestWorkspace;
beforeAll(async () => {
  ws = await createTestWorkspace();
});
afterAll(closeDb);

const HEADER = "label,level,quantity,lu,kx,ky,braced,shape,b,h,D,fc,fy,bar_size,nb,nh,n,brace_levels,max_b,limit_note";
const ROWS = [
  "M-1,L1,4,180,1,1,braced,rect,18,18,,5,60,#8,3,3,,0,24,architect",
  "M-2,L1,2,240,1,1,braced,circle,,,20,5,60,#9,,,8,1,,",
  "M-3,L2,1,150,1.2,1.2,sway,rect,16,20,,4,60,#7,,,3,0,,",
];

type Report = { committed: boolean; rowsWithErrors: number; imported: number; skipped: number; rows: Array<{ row: number; errors: Array<{ column: string; message: string }> }> };

async function post(projectId: string, body: Record<string, unknown>, user = ws.members.engineer) {
  return callRoute<{ report: Report; issues?: Array<{ path: string }> }>(importRoute.POST, `/api/projects/${projectId}/marks/import`, {
    method: "POST",
    user,
    params: { projectId },
    body: { filename: "marks.csv", ...body },
  });
}

async function marksOf(projectId: string) {
  return testDb().select().from(columnMarks).where(eq(columnMarks.projectId, projectId));
}

describe("CSV import of column marks", () => {
  it("creates every mark of a clean file with its layout (perimeter, circle, faces) and keeps the file", async () => {
    const p = await createProjectAs(ws.members.owner, ws.id, "Marks import");
    const content = [HEADER, ...ROWS].join("\n");
    const res = await post(p.id, { content, mode: "commit" });
    expect(res.status).toBe(201);
    expect(res.json.report).toMatchObject({ imported: 3, skipped: 0 });
    const marks = await marksOf(p.id);
    const byLabel = Object.fromEntries(marks.map((m) => [m.label, m]));
    expect(byLabel["M-1"]?.design).toMatchObject({ section: { shape: "rect", b: 18, h: 18, layout: { type: "perimeter", size: "#8", nb: 3, nh: 3 }, cover: 1.5 }, braceLevels: 0 });
    expect(byLabel["M-1"]?.limits).toEqual({ maxB: 24, note: "architect" });
    expect(byLabel["M-2"]?.design).toMatchObject({ section: { shape: "circle", D: 20, layout: { type: "circle", n: 8 } }, braceLevels: 1 });
    expect(byLabel["M-3"]?.design).toMatchObject({ section: { layout: { type: "faces", size: "#7", n: 3 } } });
    expect(byLabel["M-3"]?.member).toMatchObject({ braced: false, kx: 1.2 });
    const [file] = await testDb().select().from(loadImports).where(eq(loadImports.projectId, p.id));
    expect(file).toMatchObject({ kind: "marks", content, rowsImported: 3 });
  });

  it("reports bad cells by row and column and imports nothing unless told to skip them", async () => {
    const p = await createProjectAs(ws.members.owner, ws.id, "Marks import 2");
    await createMarkAs(ws.members.owner, p.id, markBody("X-1", "L1"));
    const content = [HEADER, ROWS[0], "M-9,L1,1,-5,1,1,braced,rect,18,18,,5,60,#8,3,3,,0,,", "X-1,L1,1,120,1,1,braced,rect,18,18,,5,60,#8,3,3,,0,,", "M-8,L1,1,120,1,1,sideways,hexagon,18,18,,5,60,#8,3,3,,0,,"].join("\n");
    const res = await post(p.id, { content, mode: "commit" });
    expect(res.status).toBe(422);
    expect(res.json.issues?.map((i) => i.path)).toEqual(["rows.2.lu", "rows.3.label", "rows.4.braced", "rows.4.shape"]);
    expect((await marksOf(p.id)).map((m) => m.label)).toEqual(["X-1"]);

    const skipped = await post(p.id, { content, mode: "commit", skipInvalid: true });
    expect(skipped.status).toBe(201);
    expect(skipped.json.report).toMatchObject({ imported: 1, skipped: 3 });
    expect((await marksOf(p.id)).map((m) => m.label).sort()).toEqual(["M-1", "X-1"]);
  });

  it("converts an SI project's millimetres and megapascals to in and ksi", async () => {
    const p = await createProjectAs(ws.members.owner, ws.id, "SI marks");
    await callRoute(projectRoute.PATCH, `/api/projects/${p.id}`, { method: "PATCH", user: ws.members.owner, params: { projectId: p.id }, body: { version: 1, units: "SI" } });
    const res = await post(p.id, { content: "label,lu,shape,b,h,fc,fy,bar_size,nb,nh,cover\nS-1,4572,rect,457.2,508,34.47,413.7,#8,3,3,38.1", mode: "commit" });
    expect(res.status).toBe(201);
    const [mark] = await marksOf(p.id);
    // 25.4 mm = 1 in exactly; 1 ksi = 6.894757 MPa (definitions of the inch and the pound-force)
    expect((mark?.member as { lu: number }).lu).toBeCloseTo(4572 / MM_PER_IN, 9);
    const section = (mark?.design as { section: { b: number; h: number; fc: number; fy: number; cover: number } }).section;
    expect(section.b).toBeCloseTo(18, 9);
    expect(section.h).toBeCloseTo(20, 9);
    expect(section.cover).toBeCloseTo(1.5, 9);
    expect(section.fc).toBeCloseTo(34.47 / MPA_PER_KSI, 9);
    expect(section.fc).toBeCloseTo(5, 2);
  });

  it("lets reviewers preview but not import (403)", async () => {
    const p = await createProjectAs(ws.members.owner, ws.id, "Marks import roles");
    const content = [HEADER, ROWS[0]].join("\n");
    expect((await post(p.id, { content, mode: "preview" }, ws.members.reviewer)).status).toBe(200);
    expect((await post(p.id, { content, mode: "commit" }, ws.members.reviewer)).status).toBe(403);
    expect((await post(p.id, { content, mode: "commit" }, ws.members.estimator)).status).toBe(403);
  });
});
