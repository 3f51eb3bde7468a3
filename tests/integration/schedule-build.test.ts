/**
 * The column schedule against the real PostgreSQL: rows checked live from the stored designs with
 * the latest price book, quantities and costs against closed-form values (column-checks.md §6),
 * totals as sums of rows and by level, the approved alternative's stale flag, the CSV read back,
 * and the route's authentication and workspace isolation.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import Papa from "papaparse";
import { closeDb, testDb } from "./support/database";
import { adoptedAlternatives } from "@/db/schema";
import { callRoute } from "./support/session";
import { createReportFixture, PRICES, type ReportFixture, type FixtureMark } from "./schedule-fixtures";
import { buildSchedule, type ScheduleRow } from "@/lib/schedule/build-schedule";
import { scheduleToCsv, SCHEDULE_CSV_HEADERS, LEVEL_TOTAL_LABEL, PROJECT_TOTAL_LABEL } from "@/lib/schedule/schedule-csv";
import { readMarkInputs } from "@/db/queries/search-inputs";
import { buildMarkCheckInput } from "@/lib/mark-check-input";
import { checkMember, type SectionInput } from "@/engine";
import { CAUTION, CODE_EDITION } from "@/lib/caution";
import * as scheduleRoute from "@/app/api/projects/[projectId]/schedule/route";

let fx: ReportFixture;

beforeAll(async () => {
  fx = await createReportFixture();
});
afterAll(closeDb);

function rowOf(rows: ScheduleRow[], label: string): ScheduleRow {
  const row = rows.find((r) => r.label === label);
  if (!row) throw new Error(`no row ${label}`);
  return row;
}

function grossArea(s: SectionInput): number {
  return s.shape === "circle" ? (Math.PI * (s.D ?? 0) ** 2) / 4 : (s.b ?? 0) * (s.h ?? 0);
}
function perimeter(s: SectionInput): number {
  return s.shape === "circle" ? Math.PI * (s.D ?? 0) : 2 * ((s.b ?? 0) + (s.h ?? 0));
}

describe("buildSchedule", () => {
  it("has one row per mark, ordered by level then label, with the design summary", async () => {
    const schedule = await buildSchedule(fx.projectId);
    expect(schedule).not.toBeNull();
    if (!schedule) return;
    expect(schedule.rows.map((r) => `${r.level}/${r.label}`)).toEqual(["L1/C-1", "L1/C-2", "L2/C-7", "L2/C-9"]);
    expect(schedule.priceBookRevision).toBe(2);
    expect(schedule.codeEdition).toBe(CODE_EDITION);
    expect(schedule.caution).toBe(CAUTION);
    const c1 = rowOf(schedule.rows, "C-1");
    expect(c1.design).toBe("18×22 in, 8 #8, f'c 5 ksi, fy 60 ksi, tied, no brace");
    expect([c1.shape, c1.b, c1.h, c1.D, c1.fc, c1.fy, c1.bars, c1.barCount, c1.braceLevels]).toEqual(["rect", 18, 22, null, 5, 60, "8 #8", 8, 0]);
    const c2 = rowOf(schedule.rows, "C-2");
    expect(c2.design).toBe("16×16 in, 8 #9, f'c 5 ksi, fy 60 ksi, tied, 1 brace level");
    const c7 = rowOf(schedule.rows, "C-7");
    expect([c7.shape, c7.D, c7.b, c7.bars]).toEqual(["circle", 20, null, "8 #8"]);
  });

  it("checks each stored design live: verdict and utilization equal the engine's check with the latest prices", async () => {
    const schedule = await buildSchedule(fx.projectId);
    if (!schedule) throw new Error("no schedule");
    for (const key of ["c1", "c2", "c7"] as const) {
      const inputs = await readMarkInputs(fx.marks[key].id);
      if (!inputs) throw new Error("inputs");
      const direct = checkMember(buildMarkCheckInput(inputs, { section: fx.marks[key].section, braceLevels: fx.marks[key].braceLevels }));
      const row = rowOf(schedule.rows, fx.marks[key].label);
      expect(row.pass).toBe(direct.pass);
      expect(row.utilization).toBe(direct.utilization);
      expect(row.governing).toBe(direct.governing);
      expect(row.reasons).toEqual(direct.reasons);
      expect(row.cost?.perColumn.total).toBeCloseTo(direct.cost?.total ?? NaN, 1);
    }
    // C-9 has no load combinations: no verdict, but its quantities are still scheduled
    const c9 = rowOf(schedule.rows, "C-9");
    expect(c9.pass).toBe(false);
    expect(c9.utilization).toBeNull();
    expect(c9.reasons.join(" ")).toMatch(/no load combinations/);
    expect(c9.quantities?.perColumn.concreteYd3).toBeCloseTo((16 * 16 * 180) / 46656, 2);
  });

  it("reports quantities and costs per column and extended by the number of columns", async () => {
    const schedule = await buildSchedule(fx.projectId);
    if (!schedule) throw new Error("no schedule");
    const marks: FixtureMark[] = Object.values(fx.marks);
    for (const m of marks) {
      const row = rowOf(schedule.rows, m.label);
      const q = row.quantities;
      const c = row.cost;
      if (!q || !c) throw new Error(`${m.label} has no quantities or cost`);
      // concrete Ag·L / 46 656 in³ per yd³; forms perimeter × L (column-checks.md §6; 46 656 = 36³)
      const yd3 = (grossArea(m.section) * m.lu) / 46656;
      const ft2 = (perimeter(m.section) * m.lu) / 144;
      expect(q.perColumn.concreteYd3).toBeCloseTo(yd3, 2);
      expect(q.perColumn.formFt2).toBeCloseTo(ft2, 1);
      expect(q.extended.concreteYd3).toBeCloseTo(q.perColumn.concreteYd3 * m.quantity, 6);
      expect(q.extended.steelLb).toBeCloseTo(q.perColumn.steelLb * m.quantity, 6);
      expect(q.extended.formFt2).toBeCloseTo(q.perColumn.formFt2 * m.quantity, 6);
      // prices of revision 2, the latest (revision 1 would give 160 $/yd³ for f'c 5)
      const concretePrice = PRICES.concrete[String(m.section.fc)] ?? NaN;
      expect(c.perColumn.concrete).toBeCloseTo(yd3 * concretePrice, 0);
      expect(c.perColumn.formwork).toBeCloseTo(ft2 * (m.section.shape === "circle" ? PRICES.roundFormwork : PRICES.formwork), 0);
      expect(c.perColumn.steel).toBeCloseTo(q.perColumn.steelLb * PRICES.steel, 0);
      expect(c.perColumn.bracing).toBe(m.braceLevels * PRICES.brace);
      expect(c.perColumn.total).toBeCloseTo(c.perColumn.concrete + c.perColumn.steel + c.perColumn.formwork + c.perColumn.bracing, 6);
      expect(c.extended.total).toBeCloseTo(c.perColumn.total * m.quantity, 6);
    }
    // C-1 steel: at least the 8 #8 bars with their compression laps, 0.0005·fy·db = 30 in (25.5.5.1),
    // at 2.670 lb/ft (ASTM A615 #8) — ties and cross-ties come on top
    const c1 = rowOf(schedule.rows, "C-1");
    const longitudinal = (8 * (204 + 30)) / 12 * 2.67;
    expect(c1.quantities?.perColumn.steelLb).toBeGreaterThan(longitudinal);
    expect(c1.quantities?.perColumn.steelLb).toBeLessThan(longitudinal * 1.3);
  });

  it("totals are the sums of the rows, by category and by level", async () => {
    const schedule = await buildSchedule(fx.projectId);
    if (!schedule) throw new Error("no schedule");
    const sum = (rows: ScheduleRow[], pick: (r: ScheduleRow) => number) => rows.reduce((s, r) => s + pick(r), 0);
    const { grand, byCategory, byLevel } = schedule.totals;
    expect(grand.marks).toBe(4);
    expect(grand.columns).toBe(4 + 2 + 6 + 1);
    expect(grand.concreteYd3).toBeCloseTo(sum(schedule.rows, (r) => r.quantities?.extended.concreteYd3 ?? 0), 6);
    expect(grand.steelLb).toBeCloseTo(sum(schedule.rows, (r) => r.quantities?.extended.steelLb ?? 0), 6);
    expect(grand.formFt2).toBeCloseTo(sum(schedule.rows, (r) => r.quantities?.extended.formFt2 ?? 0), 6);
    for (const k of ["concrete", "steel", "formwork", "bracing", "total"] as const) {
      expect(byCategory[k]).toBeCloseTo(sum(schedule.rows, (r) => r.cost?.extended[k] ?? 0), 6);
    }
    expect(byCategory.total).toBeCloseTo(byCategory.concrete + byCategory.steel + byCategory.formwork + byCategory.bracing, 6);
    // one brace level on C-2 × 2 columns × $2600
    expect(byCategory.bracing).toBe(2 * 2600);
    expect(byLevel.map((l) => l.level)).toEqual(["L1", "L2"]);
    for (const level of byLevel) {
      const rows = schedule.rows.filter((r) => r.level === level.level);
      expect(level.marks).toBe(rows.length);
      expect(level.columns).toBe(sum(rows, (r) => r.quantity));
      expect(level.concreteYd3).toBeCloseTo(sum(rows, (r) => r.quantities?.extended.concreteYd3 ?? 0), 6);
      expect(level.cost.total).toBeCloseTo(sum(rows, (r) => r.cost?.extended.total ?? 0), 6);
    }
    expect(byLevel.reduce((s, l) => s + l.cost.total, 0)).toBeCloseTo(grand.cost.total, 6);
    expect(schedule.totals.unpricedMarks).toBe(0);
  });

  it("reports the latest approved alternative with its stale flag", async () => {
    const schedule = await buildSchedule(fx.projectId);
    if (!schedule) throw new Error("no schedule");
    const c1 = rowOf(schedule.rows, "C-1");
    expect(c1.adoption).toMatchObject({ status: "approved", candidateId: "r18x22-f5-y60-8#8-p3x3-b0", stale: false, matchesDesign: true });
    const c7 = rowOf(schedule.rows, "C-7");
    expect(c7.adoption).toMatchObject({ status: "approved", candidateId: "c20-f6-y60-8#8-t-b0", stale: true, matchesDesign: true });
    expect(rowOf(schedule.rows, "C-2").adoption).toBeNull();
  });

  it("says when a mark no longer carries its approved alternative's design", async () => {
    await testDb().insert(adoptedAlternatives).values({ markId: fx.marks.c9.id, candidateId: "r18x18-f4-y60-4#8-p2x2-b0", candidate: {}, status: "approved", inputsHash: "h", decidedAt: new Date() });
    const schedule = await buildSchedule(fx.projectId);
    const c9 = schedule ? rowOf(schedule.rows, "C-9") : null;
    // the mark carries 16×16 in, the approval was for 18×18 in
    expect(c9?.adoption).toMatchObject({ candidateId: "r18x18-f4-y60-4#8-p2x2-b0", matchesDesign: false, stale: true });
  });

  it("returns null for an unknown project", async () => {
    expect(await buildSchedule("00000000-0000-4000-8000-000000000000")).toBeNull();
  });
});

describe("schedule CSV", () => {
  it("reads back: unit headers, one row per mark, level and project totals, then edition and caution", async () => {
    const schedule = await buildSchedule(fx.projectId);
    if (!schedule) throw new Error("no schedule");
    const csv = scheduleToCsv(schedule);
    const parsed = Papa.parse<Record<string, string>>(csv, { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual([...SCHEDULE_CSV_HEADERS]);
    expect(parsed.meta.fields).toEqual(expect.arrayContaining(["Concrete (yd³)", "Steel (lb)", "Formwork (ft²)", "Cost concrete ($)", "Cost total ($)"]));
    const data = parsed.data;
    expect(data.slice(0, 4).map((r) => r.Mark)).toEqual(["C-1", "C-2", "C-7", "C-9"]);
    const c1 = data[0];
    const row = rowOf(schedule.rows, "C-1");
    if (!c1) throw new Error("no C-1 line");
    expect(Number(c1["Quantity"])).toBe(4);
    expect(Number(c1["Concrete (yd³)"])).toBe(row.quantities?.extended.concreteYd3);
    expect(Number(c1["Cost total ($)"])).toBe(row.cost?.extended.total);
    expect(Number(c1["Utilization"])).toBeCloseTo(row.utilization ?? NaN, 3);
    expect(c1["Verdict"]).toBe(row.pass ? "passes" : "FAILS");
    expect(c1["Adopted alternative"]).toBe("r18x22-f5-y60-8#8-p3x3-b0");
    expect(c1["Adoption stale"]).toBe("current");
    expect(c1["Carries adopted design"]).toBe("yes");
    expect(data[1]?.["Carries adopted design"]).toBe("");
    expect(data[2]?.["Adoption stale"]).toBe("stale");
    expect(data[3]?.["Verdict"]).toBe("not checked");

    const levelTotals = data.filter((r) => r.Mark === LEVEL_TOTAL_LABEL);
    expect(levelTotals.map((r) => r.Level)).toEqual(["L1", "L2"]);
    const l1 = levelTotals[0];
    const l1Rows = data.slice(0, 4).filter((r) => r.Level === "L1");
    expect(Number(l1?.["Cost total ($)"])).toBeCloseTo(l1Rows.reduce((s, r) => s + Number(r["Cost total ($)"]), 0), 6);
    expect(Number(l1?.["Quantity"])).toBe(6);
    const project = data.find((r) => r.Mark === PROJECT_TOTAL_LABEL);
    expect(Number(project?.["Cost total ($)"])).toBeCloseTo(data.slice(0, 4).reduce((s, r) => s + Number(r["Cost total ($)"]), 0), 6);
    expect(Number(project?.["Concrete (yd³)"])).toBeCloseTo(data.slice(0, 4).reduce((s, r) => s + Number(r["Concrete (yd³)"]), 0), 6);

    const last = data.slice(-5);
    expect(last.map((r) => r.Mark)).toEqual(["Code edition", "Price book revision", "Units", "Generated", "Caution"]);
    expect(last[0]?.Level).toBe("ACI 318-19");
    expect(last[1]?.Level).toBe("2");
    expect(last[4]?.Level).toBe(CAUTION);
  });
});

describe("GET /api/projects/[projectId]/schedule", () => {
  const path = () => `/api/projects/${fx.projectId}/schedule`;
  it("refuses an anonymous request with 401", async () => {
    const res = await callRoute(scheduleRoute.GET, path(), { params: { projectId: fx.projectId } });
    expect(res.status).toBe(401);
  });
  it("hides the project from a member of another workspace with 404", async () => {
    const res = await callRoute(scheduleRoute.GET, path(), { user: fx.outsider.members.owner, params: { projectId: fx.projectId } });
    expect(res.status).toBe(404);
  });
  it("serves the schedule as JSON to a reviewer", async () => {
    const res = await callRoute<{ rows: ScheduleRow[]; priceBookRevision: number }>(scheduleRoute.GET, path(), { user: fx.workspace.members.reviewer, params: { projectId: fx.projectId } });
    expect(res.status).toBe(200);
    expect(res.json.rows.map((r) => r.label)).toEqual(["C-1", "C-2", "C-7", "C-9"]);
    expect(res.json.priceBookRevision).toBe(2);
  });
  it("serves ?format=csv as an attachment named after the project", async () => {
    const res = await callRoute(scheduleRoute.GET, `${path()}?format=csv`, { user: fx.workspace.members.estimator, params: { projectId: fx.projectId } });
    expect(res.status).toBe(200);
    expect(res.response.headers.get("content-type")).toMatch(/^text\/csv/);
    const expectedName = `${fx.projectName.replace(/ /g, "-")}-column-schedule.csv`;
    expect(res.response.headers.get("content-disposition")).toBe(`attachment; filename="${expectedName}"`);
    const text = typeof res.json === "object" && res.json && "raw" in res.json ? String(res.json.raw) : "";
    const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), { header: true, skipEmptyLines: true });
    expect(parsed.data[0]?.Mark).toBe("C-1");
  });
  it("rejects an unknown format with 400", async () => {
    const res = await callRoute(scheduleRoute.GET, `${path()}?format=xlsx`, { user: fx.workspace.members.owner, params: { projectId: fx.projectId } });
    expect(res.status).toBe(400);
  });
});
