/**
 * Reads a generated PDF back as text, page by page, with Mozilla's PDF.js (pdfjs-dist): the
 * same text a reader's search or copy would find.
 */
import path from "node:path";
import { createRequire } from "node:module";
import { getDocument } from "pdfjs-dist/legacy/build/pdf.mjs";

export interface PdfPageText {
  /** 1-based page number */
  page: number;
  /** text items in reading order, trimmed, empty ones dropped */
  items: string[];
  /** every item joined with single spaces */
  text: string;
}

export async function readPdfText(pdf: Buffer): Promise<PdfPageText[]> {
  // the 14 standard fonts' metrics ship inside pdfjs-dist; found from wherever it is installed
  const standardFontDataUrl = path.join(path.dirname(createRequire(import.meta.url).resolve("pdfjs-dist/package.json")), "standard_fonts") + path.sep;
  const doc = await getDocument({ data: new Uint8Array(pdf), standardFontDataUrl, verbosity: 0, isEvalSupported: false }).promise;
  const pages: PdfPageText[] = [];
  for (let i = 1; i <= doc.numPages; i++) {
    const page = await doc.getPage(i);
    const content = await page.getTextContent();
    const items = content.items.map((it) => ("str" in it ? it.str.trim() : "")).filter((s) => s.length > 0);
    pages.push({ page: i, items, text: items.join(" ").replace(/\s+/g, " ") });
  }
  await doc.destroy();
  return pages;
}
