/**
 * Page furniture for the calculation packages, on pdfkit with its built-in Helvetica: the
 * document, headings, tables that break across pages with their header repeated, and the footer
 * (code edition, page number, the caution) stamped on every page once the content is laid out.
 */
import PDFDocument from "pdfkit";
import { pdfText } from "./pdf-text";

export type Doc = PDFKit.PDFDocument;

export const PAGE = { width: 612, height: 792, left: 54, right: 54, top: 54, bottom: 78 } as const;
export const CONTENT_WIDTH = PAGE.width - PAGE.left - PAGE.right;
export const FONT = { regular: "Helvetica", bold: "Helvetica-Bold", oblique: "Helvetica-Oblique" } as const;
export const INK = { text: "#111111", muted: "#555555", rule: "#999999", light: "#dddddd", fail: "#a00000", ok: "#1f5f1f" } as const;

export function createDocument(title: string): Doc {
  return new PDFDocument({
    size: "LETTER",
    margins: { top: PAGE.top, bottom: PAGE.bottom, left: PAGE.left, right: PAGE.right },
    bufferPages: true,
    autoFirstPage: true,
    info: { Title: pdfText(title), Author: "Caryatid", Subject: "Column calculation package", Creator: "Caryatid" },
  });
}

/** Ends the document and collects its bytes. */
export function finishDocument(doc: Doc): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on("data", (chunk: Buffer) => chunks.push(chunk));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
    doc.end();
  });
}

/** Lowest y content may reach on a page. */
export function bottomLimit(doc: Doc): number {
  return doc.page.height - PAGE.bottom;
}

/** Starts a new page unless `height` points still fit below the cursor. */
export function ensureSpace(doc: Doc, height: number): void {
  if (doc.y + height > bottomLimit(doc)) doc.addPage();
}

/** Index (0-based) of the page being written. */
export function currentPageIndex(doc: Doc): number {
  const range = doc.bufferedPageRange();
  return range.start + range.count - 1;
}

export function write(doc: Doc, text: string, options: PDFKit.Mixins.TextOptions & { size?: number; font?: string; color?: string } = {}): void {
  const { size = 9.5, font = FONT.regular, color = INK.text, ...rest } = options;
  doc.font(font).fontSize(size).fillColor(color).text(pdfText(text), PAGE.left, doc.y, { width: CONTENT_WIDTH, ...rest });
}

/** Mark heading ("Column mark C-1"), at the top of a fresh page. */
export function title(doc: Doc, text: string): void {
  doc.font(FONT.bold).fontSize(17).fillColor(INK.text).text(pdfText(text), PAGE.left, doc.y, { width: CONTENT_WIDTH });
  doc.moveDown(0.2);
}

/** A sub-heading; keeps at least `keep` points of what follows on the same page. */
export function heading(doc: Doc, text: string, keep = 60): void {
  doc.moveDown(0.6);
  ensureSpace(doc, 22 + keep);
  const y = doc.y;
  doc.font(FONT.bold).fontSize(12.5).fillColor(INK.text).text(pdfText(text), PAGE.left, y, { width: CONTENT_WIDTH });
  const ruleY = doc.y + 1;
  doc.moveTo(PAGE.left, ruleY).lineTo(PAGE.left + CONTENT_WIDTH, ruleY).lineWidth(0.5).strokeColor(INK.rule).stroke();
  doc.y = ruleY + 5;
}

export function subheading(doc: Doc, text: string, keep = 40): void {
  doc.moveDown(0.4);
  ensureSpace(doc, 14 + keep);
  doc.font(FONT.bold).fontSize(10).fillColor(INK.text).text(pdfText(text), PAGE.left, doc.y, { width: CONTENT_WIDTH });
  doc.moveDown(0.15);
}

export interface TableColumn {
  header: string;
  /** share of the table width (the shares are normalised) */
  width: number;
  align?: "left" | "right" | "center";
}

export interface TableOptions {
  size?: number;
  /** rows (by index) printed in the failure colour */
  flagged?: ReadonlySet<number>;
  width?: number;
  x?: number;
}

function columnWidths(columns: TableColumn[], totalWidth: number): number[] {
  const share = columns.reduce((s, c) => s + c.width, 0);
  return columns.map((c) => (c.width / share) * totalWidth);
}

const CELL_PAD = 3;

/** Height of one table row as `table` draws it. */
export function tableRowHeight(doc: Doc, columns: TableColumn[], cells: string[], options: { size?: number; width?: number; bold?: boolean } = {}): number {
  const widths = columnWidths(columns, options.width ?? CONTENT_WIDTH);
  doc.font(options.bold ? FONT.bold : FONT.regular).fontSize(options.size ?? 8.5);
  let h = 0;
  cells.forEach((cell, i) => {
    h = Math.max(h, doc.heightOfString(pdfText(cell), { width: (widths[i] ?? 40) - 2 * CELL_PAD }));
  });
  return h + 2 * CELL_PAD;
}

/** A table; a row never splits, and the header repeats on every page the table runs onto. */
export function table(doc: Doc, columns: TableColumn[], rows: string[][], options: TableOptions = {}): void {
  const size = options.size ?? 8.5;
  const x0 = options.x ?? PAGE.left;
  const totalWidth = options.width ?? CONTENT_WIDTH;
  const widths = columnWidths(columns, totalWidth);
  const pad = CELL_PAD;
  const rowHeight = (cells: string[], font: string) => tableRowHeight(doc, columns, cells, { size, width: totalWidth, bold: font === FONT.bold });
  const drawRow = (cells: string[], font: string, color: string, fill: string | null) => {
    const h = rowHeight(cells, font);
    const y = doc.y;
    if (fill) doc.rect(x0, y, totalWidth, h).fillColor(fill).fill();
    let x = x0;
    cells.forEach((cell, i) => {
      const w = widths[i] ?? 40;
      doc
        .font(font)
        .fontSize(size)
        .fillColor(color)
        .text(pdfText(cell), x + pad, y + pad, { width: w - 2 * pad, align: columns[i]?.align ?? "left" });
      x += w;
    });
    doc.moveTo(x0, y + h).lineTo(x0 + totalWidth, y + h).lineWidth(0.3).strokeColor(INK.light).stroke();
    doc.x = PAGE.left;
    doc.y = y + h;
  };
  const header = columns.map((c) => c.header);
  const drawHeader = () => drawRow(header, FONT.bold, INK.text, "#eeeeee");
  ensureSpace(doc, rowHeight(header, FONT.bold) + rowHeight(rows[0] ?? header, FONT.regular));
  drawHeader();
  rows.forEach((cells, index) => {
    if (doc.y + rowHeight(cells, FONT.regular) > bottomLimit(doc)) {
      doc.addPage();
      drawHeader();
    }
    drawRow(cells, FONT.regular, options.flagged?.has(index) ? INK.fail : INK.text, null);
  });
  doc.moveDown(0.3);
}

/** Label/value pairs in two columns of a table without header fill. */
export function facts(doc: Doc, pairs: Array<[string, string]>, options: { x?: number; width?: number; size?: number; labelShare?: number } = {}): void {
  const size = options.size ?? 9;
  const x0 = options.x ?? PAGE.left;
  const width = options.width ?? CONTENT_WIDTH;
  const labelWidth = options.labelShare ? width * options.labelShare : Math.min(190, width * 0.45);
  for (const [label, value] of pairs) {
    doc.font(FONT.regular).fontSize(size);
    const h = Math.max(doc.heightOfString(pdfText(value), { width: width - labelWidth }), doc.heightOfString(pdfText(label), { width: labelWidth - 6 }));
    if (doc.y + h > bottomLimit(doc)) doc.addPage();
    const y = doc.y;
    doc.font(FONT.regular).fillColor(INK.muted).text(pdfText(label), x0, y, { width: labelWidth - 6 });
    doc.font(FONT.regular).fillColor(INK.text).text(pdfText(value), x0 + labelWidth, y, { width: width - labelWidth });
    doc.y = y + h + 1.5;
  }
  doc.x = PAGE.left;
}

export interface FooterInfo {
  /** what the page belongs to (project, mark), by 0-based page index */
  left: (pageIndex: number) => string;
  caution: string;
}

/** Stamps the footer (who/what, page n of N, the caution) on every buffered page. */
export function stampFooters(doc: Doc, info: FooterInfo): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    // writing inside the bottom margin must not open a new page
    const saved = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    const y = doc.page.height - PAGE.bottom + 14;
    doc.moveTo(PAGE.left, y - 4).lineTo(PAGE.left + CONTENT_WIDTH, y - 4).lineWidth(0.5).strokeColor(INK.rule).stroke();
    doc.font(FONT.regular).fontSize(7.5).fillColor(INK.muted);
    doc.text(pdfText(info.left(i)), PAGE.left, y, { width: CONTENT_WIDTH * 0.75, lineBreak: false });
    doc.text(`Page ${i + 1} of ${range.count}`, PAGE.left + CONTENT_WIDTH * 0.75, y, { width: CONTENT_WIDTH * 0.25, align: "right", lineBreak: false });
    doc.font(FONT.oblique).fontSize(6.8).fillColor(INK.muted).text(pdfText(info.caution), PAGE.left, y + 11, { width: CONTENT_WIDTH });
    doc.page.margins.bottom = saved;
  }
}
