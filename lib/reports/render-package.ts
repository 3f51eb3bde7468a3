/**
 * Calculation packages as PDF: one column mark, or the whole project with a contents page (mark →
 * page number) followed by one part per mark, each starting on a new page. Every page carries the
 * code edition, its page number and the caution in its footer. Text is set in pdfkit's built-in
 * Helvetica; Greek symbols are spelled out (see pdf-text.ts).
 */
import { readMarkInputs } from "@/db/queries/search-inputs";
import type { AlternativeRow } from "@/db/queries/alternatives";
import { fingerprintMark } from "@/lib/search-request";
import { CAUTION, CODE_EDITION } from "@/lib/caution";
import { checkStoredDesign } from "@/lib/schedule/check-stored-design";
import { describeDesign } from "@/lib/schedule/describe-design";
import { readLatestApproved, readProjectMarks } from "@/lib/schedule/read-project-marks";
import { FONT, INK, PAGE, bottomLimit, createDocument, currentPageIndex, facts, finishDocument, heading, stampFooters, table, tableRowHeight, title, write, type Doc, type TableColumn } from "./pdf-document";
import { markTitle, verdictWord, writeMarkSection, type MarkReport } from "./write-mark-section";

const today = () => new Date().toISOString().slice(0, 10);

function reportOf(inputs: MarkReport["inputs"], approved: AlternativeRow | null): MarkReport {
  return {
    inputs,
    check: checkStoredDesign(inputs),
    approved: approved ? { row: approved, stale: approved.inputsHash !== fingerprintMark(inputs) } : null,
  };
}

/** The package of one column mark, or null when the mark does not exist. */
export async function renderMarkPackage(markId: string): Promise<Buffer | null> {
  const inputs = await readMarkInputs(markId);
  if (!inputs) return null;
  const report = reportOf(inputs, await readLatestApproved(markId));
  const doc = createDocument(`${inputs.project.name}: column mark ${inputs.mark.label}`);
  writeMarkSection(doc, report);
  const date = today();
  stampFooters(doc, { left: () => `${inputs.project.name} · ${markTitle(inputs.mark.label)} · ${CODE_EDITION} · ${date}`, caution: CAUTION });
  return finishDocument(doc);
}

const CONTENTS_COLUMNS: TableColumn[] = [
  { header: "Mark", width: 17 },
  { header: "Level", width: 8 },
  { header: "Qty", width: 5, align: "right" },
  { header: "Design", width: 52 },
  { header: "Verdict", width: 11 },
  { header: "Page", width: 7, align: "right" },
];

/** The package of every mark of a project, with a contents page; null when the project does not exist. */
export async function renderProjectPackage(projectId: string): Promise<Buffer | null> {
  const data = await readProjectMarks(projectId);
  if (!data) return null;
  const { project } = data;
  const reports = data.marks.map(({ inputs, approved }) => reportOf(inputs, approved));
  const doc = createDocument(`${project.name}: column calculation package`);

  // Contents first: its text does not depend on the page numbers, so its rows are measured now,
  // split over as many reserved pages as they need, and written once the marks are laid out.
  writeContentsHeader(doc, project, data.priceBook?.revision ?? null, reports);
  const rows = reports.map((r) => [
    markTitle(r.inputs.mark.label),
    r.inputs.mark.level || "—",
    String(r.inputs.mark.quantity),
    describeDesign(r.check.section, r.check.design.section, r.check.design.braceLevels),
    verdictWord(r.check),
    "0000",
  ]);
  const headerHeight = tableRowHeight(doc, CONTENTS_COLUMNS, CONTENTS_COLUMNS.map((c) => c.header), { bold: true });
  const pages: Array<{ y: number; rows: number[] }> = [{ y: doc.y, rows: [] }];
  let y = doc.y + headerHeight;
  rows.forEach((row, i) => {
    const h = tableRowHeight(doc, CONTENTS_COLUMNS, row);
    if (y + h > bottomLimit(doc) - 4) {
      pages.push({ y: PAGE.top + 24, rows: [] });
      y = PAGE.top + 24 + headerHeight;
    }
    pages[pages.length - 1]?.rows.push(i);
    y += h;
  });
  for (let i = 1; i < pages.length; i++) doc.addPage();

  // each mark on a new page; remember where it starts and which pages are its
  const starts: number[] = [];
  const owner: string[] = pages.map(() => "Contents");
  for (const report of reports) {
    doc.addPage();
    const start = currentPageIndex(doc);
    starts.push(start);
    writeMarkSection(doc, report);
    const end = currentPageIndex(doc);
    for (let p = start; p <= end; p++) owner[p] = markTitle(report.inputs.mark.label);
  }

  pages.forEach((page, p) => {
    doc.switchToPage(p);
    doc.x = PAGE.left;
    if (p > 0) {
      doc.y = PAGE.top;
      write(doc, "Contents (continued)", { font: FONT.bold, size: 12 });
    }
    doc.y = page.y;
    const slice = page.rows.map((i) => {
      const row = [...(rows[i] ?? [])];
      row[5] = String((starts[i] ?? 0) + 1);
      return row;
    });
    if (slice.length) table(doc, CONTENTS_COLUMNS, slice, { flagged: new Set(slice.flatMap((row, i) => (row[4] === "passes" ? [] : [i]))) });
  });
  if (reports.length === 0) {
    doc.switchToPage(0);
    write(doc, "This project has no column marks yet: add marks, then download the package again.", { color: INK.muted });
  }
  const date = today();
  stampFooters(doc, { left: (i) => `${project.name} · ${owner[i] ?? ""} · ${CODE_EDITION} · ${date}`, caution: CAUTION });
  return finishDocument(doc);
}

function writeContentsHeader(
  doc: Doc,
  project: { name: string; exposure: string; cover: number; eiOption: string; dagg: number },
  priceBookRevision: number | null,
  reports: MarkReport[],
): void {
  title(doc, `${project.name}: column calculation package`);
  const passing = reports.filter((r) => r.check.output?.pass).length;
  facts(
    doc,
    [
      ["Code edition", CODE_EDITION],
      ["Column marks", `${reports.length} (${passing} passing, ${reports.length - passing} failing or not checked)`],
      ["EI option (project default)", project.eiOption],
      ["Exposure / clear cover to ties", `${project.exposure} / ${project.cover} in`],
      ["Maximum aggregate size", `${project.dagg} in`],
      ["Price book", priceBookRevision === null ? "none: costs not priced" : `revision ${priceBookRevision}`],
      ["Generated", today()],
    ],
    { size: 9 },
  );
  heading(doc, "Contents", 40);
}
