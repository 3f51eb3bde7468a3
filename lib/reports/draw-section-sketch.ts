/**
 * The section sketch, drawn to scale with vector paths: the concrete outline, the tie (or spiral)
 * along its centreline, every longitudinal bar at its diameter, the bending axes, and the overall
 * dimensions. Section coordinates are inches from the centroid with y up (Mx compresses +y).
 */
import type { ResolvedSection } from "@/engine";
import { FONT, INK, type Doc } from "./pdf-document";
import { num, pdfText } from "./pdf-text";

export interface SketchBox {
  x: number;
  y: number;
  /** room for the drawing itself; dimensions sit outside it */
  size: number;
}

/** Draws the sketch inside the box; returns the drawing scale in points per inch. */
export function drawSectionSketch(doc: Doc, section: ResolvedSection, box: SketchBox): number {
  const width = section.shape === "circle" ? section.D : section.b;
  const depth = section.shape === "circle" ? section.D : section.h;
  const scale = box.size / Math.max(width, depth);
  const cx = box.x + box.size / 2;
  const cy = box.y + box.size / 2;
  const px = (x: number) => cx + x * scale;
  const py = (y: number) => cy - y * scale;
  const halfW = (width * scale) / 2;
  const halfH = (depth * scale) / 2;
  doc.save();

  // concrete outline
  doc.lineWidth(1.2).strokeColor(INK.text);
  if (section.shape === "circle") doc.circle(cx, cy, halfW).stroke();
  else doc.rect(cx - halfW, cy - halfH, 2 * halfW, 2 * halfH).stroke();

  // tie / spiral centreline: clear cover plus half the tie diameter in from the faces
  const inset = (section.cover + section.tie.db / 2) * scale;
  doc.lineWidth(Math.max(section.tie.db * scale, 0.6)).strokeColor("#6b6b6b");
  if (section.shape === "circle") doc.circle(cx, cy, halfW - inset).stroke();
  else {
    // the tie wraps the corner bar: its bend is concentric with that bar
    const cornerBar = Math.max(0, ...section.bars.map((b) => b.db));
    const bend = Math.max(((cornerBar + section.tie.db) / 2) * scale, 1);
    doc.roundedRect(cx - halfW + inset, cy - halfH + inset, 2 * (halfW - inset), 2 * (halfH - inset), bend).stroke();
  }

  // longitudinal bars
  doc.fillColor(INK.text);
  for (const bar of section.bars) doc.circle(px(bar.x), py(bar.y), Math.max((bar.db / 2) * scale, 0.8)).fill();

  // bending axes
  doc.lineWidth(0.4).strokeColor(INK.rule).dash(3, { space: 2 });
  doc.moveTo(cx - halfW - 8, cy).lineTo(cx + halfW + 8, cy).stroke();
  doc.moveTo(cx, cy - halfH - 8).lineTo(cx, cy + halfH + 8).stroke();
  doc.undash();
  doc.font(FONT.oblique).fontSize(8).fillColor(INK.muted);
  doc.text("x", cx + halfW + 10, cy - 4, { lineBreak: false });
  doc.text("y", cx - 2, cy - halfH - 19, { lineBreak: false });

  // overall dimensions: width below, depth to the left
  doc.lineWidth(0.5).strokeColor(INK.text);
  const dimY = cy + halfH + 14;
  doc.moveTo(cx - halfW, dimY).lineTo(cx + halfW, dimY).stroke();
  tick(doc, cx - halfW, dimY);
  tick(doc, cx + halfW, dimY);
  doc.moveTo(cx - halfW, cy + halfH + 3).lineTo(cx - halfW, dimY + 3).stroke();
  doc.moveTo(cx + halfW, cy + halfH + 3).lineTo(cx + halfW, dimY + 3).stroke();
  doc.font(FONT.regular).fontSize(8).fillColor(INK.text);
  const widthLabel = section.shape === "circle" ? `D = ${num(section.D)} in` : `b = ${num(section.b)} in`;
  doc.text(pdfText(widthLabel), cx - 40, dimY + 4, { width: 80, align: "center", lineBreak: false });
  if (section.shape === "rect") {
    const dimX = cx - halfW - 14;
    doc.moveTo(dimX, cy - halfH).lineTo(dimX, cy + halfH).stroke();
    tick(doc, dimX, cy - halfH);
    tick(doc, dimX, cy + halfH);
    doc.moveTo(cx - halfW - 3, cy - halfH).lineTo(dimX - 3, cy - halfH).stroke();
    doc.moveTo(cx - halfW - 3, cy + halfH).lineTo(dimX - 3, cy + halfH).stroke();
    doc.text(pdfText(`h = ${num(section.h)} in`), dimX - 52, cy - 4, { width: 48, align: "right", lineBreak: false });
  }
  doc.restore();
  return scale;
}

function tick(doc: Doc, x: number, y: number): void {
  doc.moveTo(x - 3, y + 3).lineTo(x + 3, y - 3).stroke();
}
