/**
 * The interaction diagram as vector lines: the nominal curve (Mn, Pn) dashed, the design curve
 * (φMn, φPn, cut at φPn,max) solid, and each load case twice — its first-order moment (open
 * circle) and its magnified moment Mc (filled), joined by a line — about one axis.
 * Axial load in kip (compression up), moment in kip-in.
 */
import type { DiagramResult } from "@/engine";
import { FONT, INK, type Doc } from "./pdf-document";
import { num, pdfText } from "./pdf-text";

export interface LoadPoint {
  /** short tag printed beside the point ("1", "2", ...) */
  tag: string;
  Pu: number;
  /** first-order moment used (after M2,min), kip-in */
  M1st: number;
  /** magnified moment Mc, kip-in; null when the column is unstable */
  Mc: number | null;
}

export interface ChartBox {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Tick step of about `target` intervals over `span`: 1, 2 or 5 × a power of ten. */
export function niceStep(span: number, target = 6): number {
  if (!(span > 0)) return 1;
  const raw = span / target;
  const power = 10 ** Math.floor(Math.log10(raw));
  const unit = raw / power;
  const nice = unit <= 1 ? 1 : unit <= 2 ? 2 : unit <= 5 ? 5 : 10;
  return nice * power;
}

export function drawInteractionDiagram(doc: Doc, diagram: DiagramResult, loads: LoadPoint[], axis: "x" | "y", box: ChartBox): void {
  const pts = diagram.points;
  const mMax = Math.max(1, ...pts.map((p) => p.Mn), ...loads.map((l) => Math.max(l.M1st, l.Mc ?? 0))) * 1.08;
  const pMax = Math.max(diagram.P0, ...loads.map((l) => l.Pu)) * 1.06;
  const pMin = Math.min(0, ...pts.map((p) => p.Pn), ...loads.map((l) => l.Pu)) * 1.06;
  const left = box.x + 46;
  const right = box.x + box.width - 8;
  const top = box.y + 14;
  const bottom = box.y + box.height - 30;
  const sx = (m: number) => left + (m / mMax) * (right - left);
  const sy = (p: number) => bottom - ((p - pMin) / (pMax - pMin)) * (bottom - top);

  doc.save();
  // grid and ticks
  doc.font(FONT.regular).fontSize(7).fillColor(INK.muted).lineWidth(0.3).strokeColor(INK.light);
  const mStep = niceStep(mMax);
  for (let m = 0; m <= mMax + 1e-9; m += mStep) {
    doc.moveTo(sx(m), top).lineTo(sx(m), bottom).stroke();
    doc.text(num(m, 0), sx(m) - 20, bottom + 3, { width: 40, align: "center", lineBreak: false });
  }
  const pStep = niceStep(pMax - pMin);
  for (let p = Math.ceil(pMin / pStep) * pStep; p <= pMax + 1e-9; p += pStep) {
    doc.moveTo(left, sy(p)).lineTo(right, sy(p)).stroke();
    doc.text(num(p, 0), box.x, sy(p) - 3, { width: 42, align: "right", lineBreak: false });
  }
  // axes
  doc.lineWidth(0.8).strokeColor(INK.text);
  doc.moveTo(left, top).lineTo(left, bottom).stroke();
  doc.moveTo(left, sy(0)).lineTo(right, sy(0)).stroke();
  doc.font(FONT.regular).fontSize(8).fillColor(INK.text);
  doc.text(pdfText(`M about ${axis} (kip-in)`), left, bottom + 14, { width: right - left, align: "center", lineBreak: false });
  doc.text("P (kip)", box.x, box.y, { width: 42, align: "right", lineBreak: false });

  // nominal curve (dashed) and design curve (solid)
  const path = (xy: Array<[number, number]>) => {
    xy.forEach(([m, p], i) => (i === 0 ? doc.moveTo(sx(m), sy(p)) : doc.lineTo(sx(m), sy(p))));
  };
  doc.lineWidth(0.9).strokeColor("#777777").dash(4, { space: 2.5 });
  path([[0, diagram.P0], ...pts.map((p): [number, number] => [p.Mn, p.Pn])]);
  doc.stroke();
  doc.undash();
  doc.lineWidth(1.4).strokeColor(INK.text);
  path([[0, diagram.phiPnMax], ...pts.map((p): [number, number] => [p.phiMn, p.phiPn])]);
  doc.stroke();

  // load points: first-order (open) → magnified (filled)
  for (const l of loads) {
    const y = sy(l.Pu);
    if (l.Mc !== null) {
      doc.lineWidth(0.6).strokeColor("#1f4f8f").moveTo(sx(l.M1st), y).lineTo(sx(l.Mc), y).stroke();
      doc.fillColor("#1f4f8f").circle(sx(l.Mc), y, 2.6).fill();
    }
    doc.lineWidth(0.8).strokeColor("#1f4f8f").circle(sx(l.M1st), y, 2.6).stroke();
    doc.font(FONT.regular).fontSize(7).fillColor("#1f4f8f").text(l.tag, sx(Math.max(l.M1st, l.Mc ?? 0)) + 4, y - 3.5, { lineBreak: false });
  }

  // legend
  const ly = box.y + box.height - 6;
  doc.font(FONT.regular).fontSize(7).fillColor(INK.text);
  let lx = left;
  doc.lineWidth(0.9).strokeColor("#777777").dash(4, { space: 2.5 }).moveTo(lx, ly + 3).lineTo(lx + 18, ly + 3).stroke().undash();
  doc.text("nominal (Mn, Pn)", lx + 22, ly, { lineBreak: false });
  lx += 100;
  doc.lineWidth(1.4).strokeColor(INK.text).moveTo(lx, ly + 3).lineTo(lx + 18, ly + 3).stroke();
  doc.text(pdfText("design (φMn, φPn)"), lx + 22, ly, { lineBreak: false });
  lx += 110;
  doc.lineWidth(0.8).strokeColor("#1f4f8f").circle(lx + 3, ly + 3, 2.6).stroke();
  doc.text("first-order", lx + 9, ly, { lineBreak: false });
  lx += 62;
  doc.fillColor("#1f4f8f").circle(lx + 3, ly + 3, 2.6).fill();
  doc.fillColor(INK.text).text("magnified Mc", lx + 9, ly, { lineBreak: false });
  doc.restore();
}
