/**
 * One column mark's part of a calculation package: the inputs, the section sketch and its
 * properties, the interaction diagram about the governing axis with every load point first-order
 * and magnified, the moment-magnifier chain per load case and axis with the clause beside each
 * step, the detailing checks, quantities and cost, the verdict in plain words, and the
 * assumptions. Everything comes from the live check of the stored design (checkStoredDesign),
 * the same numbers the schedule and the check screen show.
 */
import { interactionDiagram, type AxisResult, type CaseResult, type CheckOutput, type ResolvedSection } from "@/engine";
import type { MarkInputs } from "@/db/queries/search-inputs";
import type { AlternativeRow } from "@/db/queries/alternatives";
import type { StoredDesignCheck } from "@/lib/schedule/check-stored-design";
import { describeDesign } from "@/lib/schedule/describe-design";
import { CAUTION, CODE_EDITION } from "@/lib/caution";
import { CONTENT_WIDTH, FONT, INK, PAGE, facts, heading, subheading, table, title, write, type Doc } from "./pdf-document";
import { drawSectionSketch } from "./draw-section-sketch";
import { drawInteractionDiagram, type LoadPoint } from "./draw-interaction-diagram";
import { money, num } from "./pdf-text";

/** The sub-headings of every mark's part, in order (tests read them back). */
export const MARK_HEADINGS = ["Inputs", "Section", "Interaction diagram", "Moment magnifier", "Detailing checks", "Quantities and cost", "Verdict", "Assumptions"] as const;

export interface MarkReport {
  inputs: MarkInputs;
  check: StoredDesignCheck;
  /** the mark's latest approved alternative and whether the inputs moved on since */
  approved: { row: AlternativeRow; stale: boolean } | null;
}

const EI_FORMULA: Record<string, string> = {
  a: "(a) EI = 0.4 Ec Ig / (1 + βdns)",
  b: "(b) EI = (0.2 Ec Ig + Es Ise) / (1 + βdns)",
  c: "(c) EI = Ec I / (1 + βdns), I = (0.80 + 25 Ast/Ag)(1 − Mu/(Pu h) − 0.5 Pu/P0) Ig within 0.35 Ig … 0.875 Ig",
};

export function markTitle(label: string): string {
  return `Column mark ${label}`;
}

/** One-word verdict for headings and the contents page. */
export function verdictWord(check: StoredDesignCheck): "passes" | "FAILS" | "not checked" {
  if (!check.output) return "not checked";
  return check.output.pass ? "passes" : "FAILS";
}

/** Writes the mark's part starting at the cursor (the caller opens the page). */
export function writeMarkSection(doc: Doc, report: MarkReport): void {
  const { inputs, check } = report;
  const mark = inputs.mark;
  title(doc, markTitle(mark.label));
  write(doc, `${inputs.project.name} · level ${mark.level || "—"} · ${mark.quantity} identical column${mark.quantity === 1 ? "" : "s"}`, { color: INK.muted });
  write(doc, `${describeDesign(check.section, check.design.section, check.design.braceLevels)} — ${verdictLine(check)}`, { font: FONT.bold, size: 10 });

  writeInputs(doc, report);
  writeSection(doc, check);
  writeDiagram(doc, check);
  writeMagnifier(doc, check);
  writeDetailing(doc, check);
  writeCost(doc, check, inputs);
  writeVerdict(doc, report);
  writeAssumptions(doc, report);
}

function verdictLine(check: StoredDesignCheck): string {
  const out = check.output;
  if (!out) return "not checked";
  const u = out.utilization === null ? "utilization unbounded" : `utilization ${num(out.utilization, 3)}`;
  return `${out.pass ? "passes" : "FAILS"}, ${u}${out.governing ? ` under ${out.governing}` : ""}`;
}

interface StoredMember {
  lu: number;
  lux?: number;
  luy?: number;
  kx: number;
  ky: number;
  braced: boolean;
  transverseLoad?: boolean | { x?: boolean; y?: boolean };
  psi?: { x?: { top: number; bottom: number }; y?: { top: number; bottom: number } };
  sway?: unknown;
  pourHeight?: number;
}

function transverseText(t: StoredMember["transverseLoad"]): string {
  if (t === undefined || t === false) return "none (Cm from the end moments)";
  if (t === true) return "yes, both axes (Cm = 1.0)";
  const axes = [t.x ? "x" : null, t.y ? "y" : null].filter(Boolean);
  return axes.length ? `about ${axes.join(" and ")} (Cm = 1.0 there)` : "none (Cm from the end moments)";
}

function writeInputs(doc: Doc, { inputs, check }: MarkReport): void {
  heading(doc, "Inputs");
  const m = inputs.mark.member as StoredMember;
  const s = check.design.section;
  const sec = check.section;
  const pairs: Array<[string, string]> = [
    ["Clear height l_u", `${num(m.lu)} in${m.lux ? `; about x ${num(m.lux)} in` : ""}${m.luy ? `; about y ${num(m.luy)} in` : ""}`],
    ["Effective length factors", `kx = ${num(m.kx, 3)}, ky = ${num(m.ky, 3)}${m.psi ? " (from ψ at the column ends, alignment-chart equations, R6.2.5)" : ""}`],
    ["Frame", m.braced ? "braced (nonsway), 6.6.4.5" : "sway, 6.6.4.6"],
    ["Intermediate brace levels", String(check.design.braceLevels)],
    ["Transverse load between supports", transverseText(m.transverseLoad)],
    ...(m.pourHeight ? ([["Pour height (quantities)", `${num(m.pourHeight)} in`]] as Array<[string, string]>) : []),
    ["Section shape", s.shape === "circle" ? `circular, D = ${num(s.D)} in` : `rectangular, b = ${num(s.b)} in (depth for bending about y), h = ${num(s.h)} in (depth for bending about x)`],
    ["Concrete f'c / steel fy", `${num(s.fc)} ksi / ${num(s.fy)} ksi`],
    ["Confinement", s.confinement],
    ["Clear cover to ties", `${num(s.cover)} in (exposure: ${inputs.project.exposure})`],
    ["Longitudinal bars", sec ? `${sec.bars.length} bars: ${describeBarsWithArea(sec)}` : "—"],
    ["Ties", sec ? `${sec.tie.size} at ${num(sec.tie.spacing)} in (${sec.tie.given ? "as given" : "derived: size 25.7.2.2, largest spacing 25.7.2.1"})` : "—"],
    ["Maximum aggregate size", `${num(inputs.project.dagg)} in`],
    ["Price book", inputs.priceBook ? `revision ${inputs.priceBook.revision}` : "none: costs not priced"],
  ];
  facts(doc, pairs);
  subheading(doc, "Load combinations (factored; end moments as magnitudes, M1 <= M2)");
  if (inputs.loads.length === 0) {
    write(doc, "No load combinations are stored for this mark: add them to check it.", { color: INK.fail });
    return;
  }
  table(
    doc,
    [
      { header: "Combination", width: 18 },
      { header: "Pu (kip)", width: 9, align: "right" },
      { header: "βdns", width: 9, align: "right" },
      { header: "Mx M1 (kip-in)", width: 11, align: "right" },
      { header: "Mx M2 (kip-in)", width: 11, align: "right" },
      { header: "Mx curvature", width: 9 },
      { header: "My M1 (kip-in)", width: 11, align: "right" },
      { header: "My M2 (kip-in)", width: 11, align: "right" },
      { header: "My curvature", width: 9 },
    ],
    inputs.loads.map((l) => {
      const mx = l.Mx as { M1: number; M2: number; curvature: string };
      const my = l.My as { M1: number; M2: number; curvature: string } | null;
      return [l.name, num(l.Pu, 1), num(l.betaDns, 3), num(mx.M1, 1), num(mx.M2, 1), mx.curvature, my ? num(my.M1, 1) : "—", my ? num(my.M2, 1) : "—", my ? my.curvature : "—"];
    }),
  );
}

function describeBarsWithArea(sec: ResolvedSection): string {
  const counts = new Map<string, { n: number; area: number }>();
  for (const b of sec.bars) {
    const c = counts.get(b.size) ?? { n: 0, area: b.area };
    c.n += 1;
    counts.set(b.size, c);
  }
  return [...counts.entries()].map(([size, c]) => `${c.n} ${size} (${num(c.area)} in² each)`).join(" + ");
}

function writeSection(doc: Doc, check: StoredDesignCheck): void {
  heading(doc, "Section", 230);
  const sec = check.section;
  if (!sec) {
    write(doc, check.problem ?? "The stored design is not a valid section.", { color: INK.fail });
    return;
  }
  const y0 = doc.y;
  const size = 150;
  const scale = drawSectionSketch(doc, sec, { x: PAGE.left + 62, y: y0 + 18, size });
  doc.font(FONT.oblique).fontSize(7.5).fillColor(INK.muted).text(`drawn to scale, 1:${num(72 / scale, 1)} at 100 %`, PAGE.left, y0 + size + 52, { width: 260, align: "center" });
  doc.y = y0 + 4;
  const pairs: Array<[string, string]> = [
    ["Gross area Ag", `${num(sec.Ag, 1)} in²`],
    ["Steel area Ast", `${num(sec.Ast, 2)} in²`],
    ["Steel ratio ρ = Ast/Ag", num(sec.rho, 4)],
    ["Ec = 57 000 √f'c (19.2.2.1)", `${num(sec.Ec, 0)} ksi`],
    ["Es (20.2.2.2)", `${num(sec.Es, 0)} ksi`],
    ["β1 (Table 22.2.2.4.3)", num(sec.beta1, 3)],
    ["Ig about x / about y", `${num(sec.Igx, 0)} / ${num(sec.Igy, 0)} in⁴`],
    ["Ise about x / about y", `${num(sec.Isex, 0)} / ${num(sec.Isey, 0)} in⁴`],
    ["P0 = 0.85 f'c (Ag − Ast) + fy Ast (22.4.2.2)", `${num(sec.P0, 1)} kip`],
    [`Pn,max = ${sec.confinement === "spiral" ? "0.85" : "0.80"} P0 (Table 22.4.2.1)`, `${num(sec.PnMax, 1)} kip`],
    [`φPn,max, φ = ${sec.confinement === "spiral" ? "0.75" : "0.65"} (21.2.2)`, `${num(sec.phiPnMax, 1)} kip`],
    ["Ties", `${sec.tie.size} at ${num(sec.tie.spacing)} in`],
  ];
  if (check.quantities) pairs.push(["Ties / cross-ties over the height", `${check.quantities.ties} / ${check.quantities.crossTies}`]);
  facts(doc, pairs, { x: PAGE.left + 262, width: CONTENT_WIDTH - 262, size: 8.5, labelShare: 0.6 });
  doc.y = Math.max(doc.y, y0 + size + 66);
  doc.x = PAGE.left;
}

/** The governing axis: the one with the larger ratio in the governing load case (x on a tie). */
export function governingAxis(out: CheckOutput | null): "x" | "y" {
  if (!out) return "x";
  const c = out.cases.find((k) => k.name === out.governing) ?? out.cases[0];
  if (!c) return "x";
  const rx = c.x.ratio ?? Number.POSITIVE_INFINITY;
  const ry = c.y.ratio ?? Number.POSITIVE_INFINITY;
  if (rx === ry) return c.y.Mc > c.x.Mc ? "y" : "x";
  return ry > rx ? "y" : "x";
}

function writeDiagram(doc: Doc, check: StoredDesignCheck): void {
  heading(doc, "Interaction diagram", 300);
  const sec = check.section;
  if (!sec) {
    write(doc, "No diagram: the stored design is not a valid section.", { color: INK.fail });
    return;
  }
  const out = check.output;
  const axis = governingAxis(out);
  const diagram = interactionDiagram(sec, axis, 60);
  const cases = out?.cases ?? [];
  const loads: LoadPoint[] = cases.map((c, i) => ({ tag: `${i + 1}${c.biaxial ? "*" : ""}`, Pu: c.Pu, M1st: c[axis].M2, Mc: c[axis].slender && c[axis].delta === null ? null : c[axis].Mc }));
  write(
    doc,
    out
      ? `About ${axis}, the governing axis (load combination "${out.governing ?? "—"}"). Each load combination is plotted at its factored Pu with its first-order moment M2 (after M2,min) and its magnified moment Mc.`
      : `About ${axis}. ${check.problem ?? ""}`,
    { size: 8.5, color: INK.muted },
  );
  const y0 = doc.y + 4;
  drawInteractionDiagram(doc, diagram, loads, axis, { x: PAGE.left, y: y0, width: CONTENT_WIDTH, height: 250 });
  doc.x = PAGE.left;
  doc.y = y0 + 258;
  const notes: string[] = [];
  if (cases.some((c) => c.biaxial)) notes.push("* checked biaxially: the resultant of Mcx and Mcy against the capacity in its own direction (see Moment magnifier); the uniaxial curve alone does not decide those cases.");
  if (sec.shape === "circle") notes.push("Circular section: the check uses the weaker of the bar layout as given and the layout turned by half a bar pitch; the curves show the layout as given.");
  for (const n of notes) write(doc, n, { size: 8, color: INK.muted });
  if (notes.length) doc.moveDown(0.3);
  if (cases.length === 0) return;
  table(
    doc,
    [
      { header: "#", width: 3 },
      { header: "Combination", width: 20 },
      { header: "Pu (kip)", width: 9, align: "right" },
      { header: `M2 about ${axis} (kip-in)`, width: 13, align: "right" },
      { header: `Mc about ${axis} (kip-in)`, width: 13, align: "right" },
      { header: "φMn at Pu (kip-in)", width: 13, align: "right" },
      { header: "Mc/φMn", width: 9, align: "right" },
      { header: "Case utilization", width: 10, align: "right" },
    ],
    cases.map((c, i) => [loads[i]?.tag ?? String(i + 1), c.name, num(c.Pu, 1), num(c[axis].M2, 1), loads[i]?.Mc === null ? "unstable" : num(c[axis].Mc, 1), num(c[axis].phiMn, 1), num(c[axis].ratio, 3), c.utilization === null ? "unbounded" : num(c.utilization, 3)]),
    { flagged: new Set(cases.flatMap((c, i) => (c.pass ? [] : [i]))) },
  );
}

/** The depth in the direction considered for M2,min (6.6.4.5.4): h about x, b about y, D for circles. */
function depthFor(sec: ResolvedSection, axis: "x" | "y"): number {
  if (sec.shape === "circle") return sec.D;
  return axis === "x" ? sec.h : sec.b;
}

function chainRows(c: CaseResult, sec: ResolvedSection, braced: boolean, eiOption: string): { rows: string[][]; flagged: Set<number> } {
  const rows: string[][] = [];
  const flagged = new Set<number>();
  const both = (label: string, clause: string, f: (a: AxisResult, axis: "x" | "y") => string, bad?: (a: AxisResult) => boolean) => {
    if (bad && (bad(c.x) || bad(c.y))) flagged.add(rows.length);
    rows.push([label, clause, f(c.x, "x"), f(c.y, "y")]);
  };
  const slenderOnly = (a: AxisResult, text: string) => (a.slender ? text : "not needed");
  both("k l_u / r", "6.2.5.2, 6.2.5.1", (a) => num(a.klur, 1));
  both(braced ? "Limit 34 + 12 (M1/M2) <= 40" : "Limit (sway) 22", braced ? "6.2.5.1(b),(c)" : "6.2.5.1(a)", (a) => num(a.limit, 1));
  both("Slenderness", "6.2.5.1", (a) => (a.slender ? "to be considered" : "may be neglected"));
  both(`EI, option ${EI_FORMULA[eiOption] ?? eiOption} (kip-in²)`, "6.6.4.4.4", (a) => slenderOnly(a, num(a.EI, 0)));
  both("Pc = π² EI / (k l_u)² (kip)", "6.6.4.4.2", (a) => slenderOnly(a, num(a.Pc, 0)));
  both("Cm = 0.6 − 0.4 (M1/M2); 1.0 with transverse load or M2,min", "6.6.4.5.3", (a) => slenderOnly(a, num(a.Cm, 3)));
  both("δ = Cm / (1 − Pu / (0.75 Pc)) >= 1.0", "6.6.4.5.2", (a) => (a.slender ? (a.delta === null ? "unstable: Pu >= 0.75 Pc" : num(a.delta, 3)) : "1 (neglected)"), (a) => a.slender && a.delta === null);
  if (c.x.deltaS !== undefined || c.y.deltaS !== undefined) {
    both("δs = 1 / (1 − Q) or 1 / (1 − ΣPu / (0.75 ΣPc))", "6.6.4.6.2", (a) => (a.deltaS === undefined ? "—" : a.deltaS === null ? "unstable story" : num(a.deltaS, 3)));
  }
  both("M2,min = Pu (0.6 + 0.03 h) (kip-in)", "6.6.4.5.4", (a, axis) => (a.slender ? `${num(c.Pu * (0.6 + 0.03 * depthFor(sec, axis)), 1)}${c.m2min === axis ? " (governs)" : ""}` : "not applied"));
  both("M2, first-order moment used (kip-in)", "6.6.4.5.4", (a) => num(a.M2, 1));
  both("Mc = δ M2 (kip-in)", "6.6.4.5.1", (a) => (a.slender && a.delta === null ? "—" : num(a.Mc, 1)));
  both(
    "Mc / M2 <= 1.4 (second-order cap)",
    "6.2.5.3",
    (a) => (a.M2 > 0 && !(a.slender && a.delta === null) ? `${num(a.Mc / a.M2, 3)} ${a.Mc / a.M2 > 1.4 + 1e-9 ? "exceeds" : "ok"}` : "—"),
    (a) => a.M2 > 0 && a.Mc / a.M2 > 1.4 + 1e-9,
  );
  both("φMn at Pu (kip-in)", "22.4, 21.2.2", (a) => num(a.phiMn, 1));
  both("Mc / φMn", "10.5.1.1", (a) => num(a.ratio, 3), (a) => a.ratio === null || a.ratio > 1);
  return { rows, flagged };
}

function writeMagnifier(doc: Doc, check: StoredDesignCheck): void {
  heading(doc, "Moment magnifier", 120);
  const out = check.output;
  const sec = check.section;
  if (!out || !sec) {
    write(doc, check.problem ?? "Not checked.", { color: INK.fail });
    return;
  }
  const braced = out.assumptions.braced;
  write(
    doc,
    `${braced ? "Nonsway" : "Sway"} moment magnifier, both axes for every load combination (slenderness about an axis whose k l_u/r is within the limit is neglected: δ = 1, Mc = M2). ${check.design.braceLevels > 0 ? `With ${check.design.braceLevels} brace level${check.design.braceLevels > 1 ? "s" : ""}, each of the ${check.design.braceLevels + 1} segments is checked with its own end moments; the governing segment is shown (0 = bottom).` : ""}`,
    { size: 8.5, color: INK.muted },
  );
  out.cases.forEach((c, i) => {
    subheading(doc, `${i + 1}. ${c.name}: Pu = ${num(c.Pu, 1)} kip, segment ${c.segment}${c.m2min ? `, M2,min governs about ${c.m2min}` : ""}`, 120);
    const { rows, flagged } = chainRows(c, sec, braced, out.assumptions.ei);
    table(
      doc,
      [
        { header: "Step", width: 44 },
        { header: "Clause", width: 14 },
        { header: "About x", width: 21, align: "right" },
        { header: "About y", width: 21, align: "right" },
      ],
      rows,
      { flagged, size: 8 },
    );
    if (c.biaxial) {
      const b = c.biaxial;
      write(doc, `Biaxial (both magnified moments > 0): resultant of Mcx = ${num(b.Mcx, 1)} and Mcy = ${num(b.Mcy, 1)} kip-in at θ = ${num(b.theta, 1)}°, capacity φMn = ${num(b.phiMn, 1)} kip-in in that direction at Pu, ratio ${num(b.ratio, 3)}.`, { size: 8.5 });
    }
    const pRatio = sec.phiPnMax > 0 ? c.Pu / sec.phiPnMax : null;
    write(doc, `Pu / φPn,max = ${num(pRatio, 3)} (Table 22.4.2.1). Case utilization = ${c.utilization === null ? "unbounded" : num(c.utilization, 3)}: ${c.pass ? "passes" : "FAILS"}.`, { size: 8.5, font: FONT.bold, color: c.pass ? INK.text : INK.fail });
    for (const r of c.reasons) write(doc, `• ${r}`, { size: 8.5, color: c.pass ? INK.text : INK.fail });
  });
}

function writeDetailing(doc: Doc, check: StoredDesignCheck): void {
  heading(doc, "Detailing checks", 80);
  const rules = check.detailing;
  if (!rules) {
    write(doc, check.problem ?? "Not checked.", { color: INK.fail });
    return;
  }
  table(
    doc,
    [
      { header: "Rule", width: 22 },
      { header: "Clause", width: 13 },
      { header: "Value", width: 12, align: "right" },
      { header: "Limit", width: 12, align: "right" },
      { header: "Result", width: 10 },
      { header: "Note", width: 31 },
    ],
    rules.map((r) => [r.rule, r.clause, `${num(r.value, 4)}${r.unit ? ` ${r.unit}` : ""}`, `${num(r.limit, 4)}${r.unit ? ` ${r.unit}` : ""}`, r.ok ? "ok" : "FAILS", r.message ?? ""]),
    { flagged: new Set(rules.flatMap((r, i) => (r.ok ? [] : [i]))) },
  );
}

function writeCost(doc: Doc, check: StoredDesignCheck, inputs: MarkInputs): void {
  heading(doc, "Quantities and cost", 80);
  const q = check.quantities;
  if (!q) {
    write(doc, check.problem ?? "No quantities.", { color: INK.fail });
    return;
  }
  write(doc, `Per column: concrete ${num(q.concreteYd3, 2)} yd³, reinforcing steel ${num(q.steelLb, 1)} lb, formwork ${num(q.formFt2, 1)} ft², ${q.ties} ties and ${q.crossTies} cross-ties over the height. ${inputs.mark.quantity} identical column${inputs.mark.quantity === 1 ? "" : "s"}.`, { size: 9 });
  if (!check.cost) {
    write(doc, "The project has no price book yet: costs are not priced.", { size: 9, color: INK.muted });
    return;
  }
  const n = inputs.mark.quantity;
  table(
    doc,
    [
      { header: "Item", width: 38 },
      { header: "Quantity", width: 13, align: "right" },
      { header: "Unit", width: 8 },
      { header: "Unit price", width: 13, align: "right" },
      { header: "Per column", width: 14, align: "right" },
      { header: `× ${n}`, width: 14, align: "right" },
    ],
    [
      ...check.cost.lines.map((l) => [l.item, num(l.quantity, 2), l.unit.replace("yd3", "yd³").replace("ft2", "ft²"), money(l.unitPrice), money(l.amount), money(l.amount * n)]),
      ["Total", "", "", "", money(check.cost.total), money(check.cost.total * n)],
    ],
  );
}

function writeVerdict(doc: Doc, { inputs, check, approved }: MarkReport): void {
  heading(doc, "Verdict", 60);
  const out = check.output;
  const label = inputs.mark.label;
  if (!out) {
    write(doc, `NOT CHECKED. Column mark ${label} has no verdict: ${check.problem ?? "the check could not run"}.`, { font: FONT.bold, size: 10.5, color: INK.fail });
  } else if (out.pass) {
    write(
      doc,
      `PASSES. The design of column mark ${label} satisfies ${CODE_EDITION} for ${out.cases.length === 1 ? "its load combination" : `all ${out.cases.length} load combinations`} with second-order (slenderness) effects included. The largest utilization is ${num(out.utilization, 3)}, under "${out.governing ?? "—"}", and every detailing check is met.`,
      { font: FONT.bold, size: 10.5, color: INK.ok },
    );
  } else {
    const failing = out.cases.filter((c) => !c.pass).length;
    const badRules = out.section.detailing.filter((r) => !r.ok).length;
    write(
      doc,
      `FAILS. The design of column mark ${label} does not satisfy ${CODE_EDITION}: ${failing} of ${out.cases.length} load combination${out.cases.length === 1 ? "" : "s"} fail${badRules ? ` and ${badRules} detailing rule${badRules === 1 ? "" : "s"} ${badRules === 1 ? "is" : "are"} not met` : ""}. Largest utilization: ${out.utilization === null ? "unbounded" : num(out.utilization, 3)}${out.governing ? ` under "${out.governing}"` : ""}.`,
      { font: FONT.bold, size: 10.5, color: INK.fail },
    );
  }
  if (out && out.reasons.length) {
    doc.moveDown(0.3);
    write(doc, out.pass ? "Notes:" : "Reasons:", { font: FONT.bold, size: 9 });
    for (const r of out.reasons) write(doc, `• ${r}`, { size: 9 });
  }
  doc.moveDown(0.3);
  if (approved) {
    const row = approved.row;
    write(
      doc,
      `Adopted alternative: ${row.candidateId}, approved${row.decidedAt ? ` ${row.decidedAt.toISOString().slice(0, 10)}` : ""}${approved.stale ? " — STALE: the loads, member data, project settings or prices changed since it was checked; re-check it" : " — current"}.`,
      { size: 9, color: approved.stale ? INK.fail : INK.text },
    );
  } else {
    write(doc, "No alternative has been approved for this mark; the design shown is the one it carries.", { size: 9, color: INK.muted });
  }
}

function writeAssumptions(doc: Doc, { inputs, check }: MarkReport): void {
  heading(doc, "Assumptions", 80);
  const out = check.output;
  const m = inputs.mark.member as StoredMember;
  const ei = out?.assumptions.ei ?? check.input.options?.ei ?? "b";
  const pairs: Array<[string, string]> = [
    ["Code edition", CODE_EDITION],
    ["EI option", `${EI_FORMULA[ei] ?? ei} (6.6.4.4.4)${check.design.ei ? " — set for this mark" : " — the project's setting"}`],
    ["Effective length factor k", `kx = ${num(m.kx, 3)}, ky = ${num(m.ky, 3)}${m.psi ? " from ψ (alignment-chart equations)" : " as given"}`],
    ["Braced or sway", m.braced ? "braced (nonsway): 6.6.4.5" : "sway: 6.6.4.6 with the story stability data given"],
    ["βdns", inputs.loads.length ? inputs.loads.map((l) => `${l.name}: ${num(l.betaDns, 3)}`).join("; ") : "—"],
    ["Units", "US customary: kip, in, ksi, kip-in, kip-in²"],
  ];
  if (check.design.braceLevels > 0) {
    pairs.push(["Intermediate bracing", `${check.design.braceLevels} brace level${check.design.braceLevels > 1 ? "s" : ""} restraining both axes, splitting l_u into ${check.design.braceLevels + 1} equal segments; each segment is checked with the end moments read off the linear first-order moment diagram. The braces themselves are not designed here.`]);
  }
  facts(doc, pairs, { size: 8.5 });
  const notes = out?.assumptions.notes ?? [];
  for (const n of notes) write(doc, `• ${n}`, { size: 8.5 });
  doc.moveDown(0.3);
  write(doc, CAUTION, { size: 8.5, font: FONT.oblique });
}
