/**
 * Reads a generated PDF back as text, page by page, with Mozilla's PDF.js (pdfjs-dist): the
 * same text a reader's search or copy would find.
 */
import path from "node:path";
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
  const standardFontDataUrl = path.join(process.cwd(), "node_modules/pdfjs-dist/standard_fonts/") ;
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
