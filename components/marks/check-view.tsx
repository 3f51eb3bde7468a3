"use client";
/**
 * The check of a mark's current design, slenderness included: verdict in plain words, the
 * section drawn to scale, the interaction diagram about each axis with first-order and magnified
 * points, the magnifier chain of a chosen combination with clauses, the detailing checks,
 * quantities and cost, and — always — the code edition, the assumptions and the caution.
 * Fed by GET /api/marks/{id}/check-input → POST /api/check and POST /api/diagram.
 */
import Link from "next/link";
import { useState } from "react";
import { useQuery } from "@tanstack/react-query";
import type { CaseResult, CheckOutput, DiagramResult } from "@/engine/types";
import { callApi } from "@/components/projects/api";
import { QueryBoundary } from "@/components/projects/query-boundary";
import { formatNumber, formatQuantity, type UnitSystem } from "@/components/projects/units";
import { SectionSketch } from "@/components/section-sketch";
import { InteractionChart, type LoadPoint } from "@/components/interaction-chart";
import { MagnifierChain } from "@/components/magnifier-chain";
import { DetailingTable } from "@/components/detailing-table";
import { CAUTION } from "@/lib/caution";
import { KG_PER_LB, M2_PER_FT2, M3_PER_YD3 } from "@/engine/units";
import type { CheckInputResponse } from "./mark-types";

export interface CheckViewProps {
  workspaceId: string;
  projectId: string;
  markId: string;
}

export function CheckView(props: CheckViewProps) {
  return (
    <QueryBoundary>
      <CheckViewInner {...props} />
    </QueryBoundary>
  );
}

/** A point fails on this axis when its own ratio exceeds 1, it is unstable, or it breaks the 1.4 cap (6.2.5.3). */
function axisPasses(c: CaseResult, axis: "x" | "y"): boolean {
  const a = c[axis];
  if (a.ratio === null || a.ratio > 1 + 1e-9) return false;
  if (a.slender && a.delta === null) return false;
  if (a.M2 > 0 && a.Mc > 1.4 * a.M2 + 1e-9) return false;
  if (c.biaxial && c.biaxial.ratio > 1 + 1e-9) return false;
  return true;
}

function verdictWords(out: CheckOutput, label: string): { headline: string; detail: string[] } {
  const gov = out.cases.find((c) => c.name === out.governing) ?? out.cases[0];
  const util = out.utilization === null ? "unbounded" : formatNumber(out.utilization, 3);
  const detailingFails = out.section.detailing.filter((d) => !d.ok);
  if (out.pass) {
    return {
      headline: `${label} passes with slenderness included: utilization ${util}, governed by ${out.governing ?? "—"}.`,
      detail: detailingFails.length === 0 ? ["Every detailing rule is met."] : [],
    };
  }
  const detail = [...out.reasons];
  if (gov) {
    const firstOrderOk = (["x", "y"] as const).every((ax) => gov[ax].phiMn > 0 && gov[ax].M2 <= gov[ax].phiMn) && gov.Pu <= out.section.phiPnMax;
    const slender = gov.x.slender || gov.y.slender;
    if (firstOrderOk && slender) detail.unshift(`Without moment magnification ${gov.name} would be within the section's strength: it fails because of slenderness.`);
  }
  for (const d of detailingFails) detail.push(`Detailing: ${d.rule} (${d.clause}) is not met${d.message ? ` — ${d.message}` : ""}.`);
  return { headline: `${label} fails: utilization ${util}, governed by ${out.governing ?? "—"}.`, detail };
}

function CheckViewInner({ workspaceId, projectId, markId }: CheckViewProps) {
  const source = useQuery({ queryKey: ["check-input", markId], queryFn: () => callApi<CheckInputResponse>(`/api/marks/${markId}/check-input`) });
  const input = source.data?.input;
  const hasLoads = (input?.loads.length ?? 0) > 0;
  const check = useQuery({
    queryKey: ["check", JSON.stringify(input)],
    queryFn: () => callApi<CheckOutput>("/api/check", { method: "POST", body: input }),
    enabled: Boolean(input) && hasLoads,
  });
  const sectionKey = JSON.stringify(input?.section);
  const diagramX = useQuery({
    queryKey: ["diagram", sectionKey, "x"],
    queryFn: () => callApi<DiagramResult>("/api/diagram", { method: "POST", body: { section: input?.section, axis: "x", points: 60 } }),
    enabled: Boolean(input),
  });
  const diagramY = useQuery({
    queryKey: ["diagram", sectionKey, "y"],
    queryFn: () => callApi<DiagramResult>("/api/diagram", { method: "POST", body: { section: input?.section, axis: "y", points: 60 } }),
    enabled: Boolean(input),
  });
  const [chosen, setChosen] = useState<string | null>(null);

  if (source.isPending) return <p className="text-ink-500">Loading the mark…</p>;
  if (source.isError) return <p role="alert">The mark could not be loaded: {source.error.message}</p>;
  const { mark, project, priceBook, notes } = source.data;
  const units: UnitSystem = project.units;
  const label = `Mark ${mark.label}${mark.level ? ` (${mark.level})` : ""}`;
  const editHref = `/w/${workspaceId}/projects/${projectId}/marks/${markId}`;
  const section = source.data.input.section;
  const member = source.data.input.member;

  if (!hasLoads) {
    return (
      <div className="panel">
        <p className="font-medium">{label} has no load combinations yet.</p>
        <p className="mt-1 text-ink-700">
          Enter them in the table or upload a CSV on the <Link href={editHref} className="text-oxide-700 underline">mark&apos;s page</Link>; the check runs as soon as there is one.
        </p>
      </div>
    );
  }
  if (check.isPending) return <p className="text-ink-500">Checking {label}…</p>;
  if (check.isError) return <p role="alert">The check could not run: {check.error.message}</p>;
  const out = check.data;
  const verdict = verdictWords(out, label);
  const selected = out.cases.find((c) => c.name === (chosen ?? out.governing)) ?? out.cases[0];
  const tieRule = out.section.detailing.find((d) => d.rule === "tie-size" || d.rule === "spiral-size");
  const points = (axis: "x" | "y"): LoadPoint[] => out.cases.map((c) => ({ name: c.name, Pu: c.Pu, firstOrder: c[axis].M2, magnified: c[axis].Mc, pass: axisPasses(c, axis) }));
  const curves = (d: DiagramResult | undefined) => ({
    nominal: (d?.points ?? []).map((p) => ({ M: p.Mn, P: p.Pn })),
    design: (d?.points ?? []).map((p) => ({ M: p.phiMn, P: p.phiPn })),
  });

  return (
    <div className="space-y-6 print:space-y-4">
      <section aria-label="Verdict" className={`panel border-l-4 ${out.pass ? "border-l-sound-600" : "border-l-strained-600"}`} data-testid="verdict">
        <p className={`text-lg font-semibold ${out.pass ? "text-sound-600" : "text-strained-600"}`} data-testid="verdict-headline">
          {out.pass ? "✓ " : "✗ "}
          {verdict.headline}
        </p>
        {verdict.detail.length > 0 ? (
          <ul className="mt-2 list-disc space-y-1 pl-5 text-sm text-ink-700">
            {verdict.detail.map((d) => (
              <li key={d}>{d}</li>
            ))}
          </ul>
        ) : null}
        <div className="no-print mt-3 flex gap-3">
          <Link href={editHref} className="btn-quiet">
            Edit the mark and its loads
          </Link>
          <button type="button" className="btn-quiet" onClick={() => window.print()}>
            Print this check
          </button>
        </div>
      </section>

      <section aria-label="Assumptions" className="panel text-sm" data-testid="assumptions">
        <h2 className="font-semibold">Basis and assumptions</h2>
        <dl className="mt-2 grid gap-x-6 gap-y-1 sm:grid-cols-2">
          <div>
            <dt className="inline text-ink-500">Code edition: </dt>
            <dd className="inline">{out.assumptions.code}</dd>
          </div>
          <div>
            <dt className="inline text-ink-500">EI option: </dt>
            <dd className="inline">({out.assumptions.ei}), 6.6.4.4.4</dd>
          </div>
          <div>
            <dt className="inline text-ink-500">Frame: </dt>
            <dd className="inline">{out.assumptions.braced ? "braced (nonsway)" : "sway"}</dd>
          </div>
          <div>
            <dt className="inline text-ink-500">k: </dt>
            <dd className="inline">
              kx = {formatNumber(out.assumptions.kx, 3)}, ky = {formatNumber(out.assumptions.ky, 3)}
            </dd>
          </div>
          <div>
            <dt className="inline text-ink-500">ℓu: </dt>
            <dd className="inline">
              {formatQuantity(member.lu, "length", units)}
              {member.lux ? `, about x ${formatQuantity(member.lux, "length", units)}` : ""}
              {member.luy ? `, about y ${formatQuantity(member.luy, "length", units)}` : ""}
              {member.braceLevels ? ` with ${member.braceLevels} intermediate brace level${member.braceLevels > 1 ? "s" : ""}` : ""}
            </dd>
          </div>
          <div>
            <dt className="inline text-ink-500">βdns: </dt>
            <dd className="inline">{source.data.input.loads.map((l) => `${l.name} ${formatNumber(l.betaDns, 2)}`).join("; ")}</dd>
          </div>
          <div>
            <dt className="inline text-ink-500">Transverse load: </dt>
            <dd className="inline">{member.transverseLoad ? "yes (Cm = 1.0)" : "none between supports"}</dd>
          </div>
          <div>
            <dt className="inline text-ink-500">Prices: </dt>
            <dd className="inline">{priceBook ? `price book revision ${priceBook.revision}` : "no price book"}</dd>
          </div>
        </dl>
        {(out.assumptions.notes ?? []).length + notes.length > 0 ? (
          <ul className="mt-2 list-disc pl-5 text-xs text-ink-700">
            {[...(out.assumptions.notes ?? []), ...notes].map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        ) : null}
        <p className="mt-3 border-t border-stone-200 pt-2 text-xs text-ink-700" data-testid="caution">
          {out.assumptions.caution || CAUTION}
        </p>
      </section>

      <section aria-label="Section" className="panel break-inside-avoid">
        <h2 className="font-semibold">Section</h2>
        <div className="mt-2 flex flex-wrap items-start gap-8">
          <SectionSketch
            shape={section.shape}
            b={section.b}
            h={section.h}
            D={section.D}
            cover={section.cover}
            bars={out.section.bars}
            tieDb={tieRule?.value}
            confinement={section.confinement}
            units={units}
            title={`Section of ${label}`}
          />
          <dl className="grid grid-cols-[auto_auto] gap-x-4 gap-y-1 text-sm">
            <dt className="text-ink-500">Ag</dt>
            <dd className="tabular-nums">{formatQuantity(out.section.Ag, "area", units)}</dd>
            <dt className="text-ink-500">Ast</dt>
            <dd className="tabular-nums">{formatQuantity(out.section.Ast, "area", units)}</dd>
            <dt className="text-ink-500">ρ = Ast/Ag</dt>
            <dd className="tabular-nums">{formatNumber(out.section.rho, 4)}</dd>
            <dt className="text-ink-500">P0 (22.4.2.2)</dt>
            <dd className="tabular-nums">{formatQuantity(out.section.P0, "force", units)}</dd>
            <dt className="text-ink-500">φPn,max (Table 22.4.2.1)</dt>
            <dd className="tabular-nums">{formatQuantity(out.section.phiPnMax, "force", units)}</dd>
            <dt className="text-ink-500">f′c, fy</dt>
            <dd className="tabular-nums">
              {formatQuantity(section.fc, "stress", units)}, {formatQuantity(section.fy, "stress", units)}
            </dd>
            <dt className="text-ink-500">Confinement</dt>
            <dd>
              {section.confinement === "spiral" ? "spiral" : "ties"}
              {tieRule ? ` (${formatQuantity(tieRule.value, "length", units)} bar)` : ""}
            </dd>
          </dl>
        </div>
      </section>

      <section aria-label="Interaction diagrams" className="panel grid gap-6 lg:grid-cols-2 print:grid-cols-2">
        {(["x", "y"] as const).map((axis) => {
          const d = axis === "x" ? diagramX : diagramY;
          return d.isError ? (
            <p key={axis} role="alert">
              The diagram about {axis} could not be drawn: {d.error.message}
            </p>
          ) : (
            <InteractionChart key={axis} axis={axis} {...curves(d.data)} loads={points(axis)} units={units} title={`Interaction diagram, bending about ${axis}`} height={400} />
          );
        })}
      </section>

      <section aria-label="Load combinations checked" className="panel">
        <h2 className="font-semibold">Load combinations</h2>
        <table className="mt-2 w-full border-collapse text-sm" data-testid="case-table">
          <thead>
            <tr className="border-b border-stone-200 text-left text-ink-500">
              <th className="py-1 pr-2 font-medium">Combination</th>
              <th className="py-1 pr-2 font-medium">Pu</th>
              <th className="py-1 pr-2 font-medium">Mcx / Mcy</th>
              <th className="py-1 pr-2 font-medium">Utilization</th>
              <th className="py-1 pr-2 font-medium">Result</th>
              <th className="py-1 font-medium">Why</th>
            </tr>
          </thead>
          <tbody>
            {out.cases.map((c) => (
              <tr key={c.name} className={`border-b border-stone-100 align-top ${c.name === selected?.name ? "bg-stone-50" : ""}`} data-testid={`case-${c.name}`}>
                <td className="py-1 pr-2">
                  <button type="button" className="text-left text-oxide-700 underline" aria-pressed={c.name === selected?.name} onClick={() => setChosen(c.name)}>
                    {c.name}
                  </button>
                  {c.name === out.governing ? <span className="ml-1 text-xs text-ink-500">(governs)</span> : null}
                </td>
                <td className="py-1 pr-2 tabular-nums">{formatQuantity(c.Pu, "force", units)}</td>
                <td className="py-1 pr-2 tabular-nums">
                  {formatQuantity(c.x.Mc, "moment", units)} / {formatQuantity(c.y.Mc, "moment", units)}
                  {c.biaxial ? <span className="block text-xs text-ink-500">biaxial: resultant ÷ φMn = {formatNumber(c.biaxial.ratio, 3)} at θ = {formatNumber(c.biaxial.theta, 1)}°</span> : null}
                </td>
                <td className="py-1 pr-2 tabular-nums">{c.utilization === null ? "unbounded" : formatNumber(c.utilization, 3)}</td>
                <td className={`py-1 pr-2 ${c.pass ? "text-sound-600" : "font-semibold text-strained-600"}`}>{c.pass ? "✓ passes" : "✗ fails"}</td>
                <td className="py-1 text-xs text-ink-700">{c.reasons.join(" ")}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>

      {selected ? (
        <section aria-label="Moment magnifier" className="panel break-inside-avoid">
          <h2 className="font-semibold">Moment magnifier — {selected.name}</h2>
          <div className="mt-2 grid gap-6 md:grid-cols-2 print:grid-cols-2">
            {(["x", "y"] as const).map((axis) => (
              <MagnifierChain key={axis} result={selected} axis={axis} braced={out.assumptions.braced} ei={out.assumptions.ei} k={axis === "x" ? out.assumptions.kx : out.assumptions.ky} units={units} />
            ))}
          </div>
          {selected.biaxial ? (
            <p className={`mt-3 text-sm ${selected.biaxial.ratio > 1 ? "font-semibold text-strained-600" : ""}`} data-testid="biaxial-step">
              Both axes at once: resultant magnified moment √(Mcx² + Mcy²) ={" "}
              {formatQuantity(Math.hypot(selected.biaxial.Mcx, selected.biaxial.Mcy), "moment", units)} at θ = {formatNumber(selected.biaxial.theta, 1)}° against φMn ={" "}
              {formatQuantity(selected.biaxial.phiMn, "moment", units)} in that direction at Pu (neutral axis rotated, strain compatibility): ratio {formatNumber(selected.biaxial.ratio, 3)}
              {selected.biaxial.ratio > 1 ? " — fails" : " — passes"}.
            </p>
          ) : null}
        </section>
      ) : null}

      <section aria-label="Detailing" className="panel break-inside-avoid">
        <h2 className="font-semibold">Detailing</h2>
        <DetailingTable detailing={out.section.detailing} units={units} />
      </section>

      <section aria-label="Quantities and cost" className="panel break-inside-avoid text-sm">
        <h2 className="font-semibold">Quantities and cost (one column)</h2>
        <p className="mt-1">
          {units === "SI"
            ? `Concrete ${formatNumber(out.quantities.concreteYd3 * M3_PER_YD3, 2)} m³ · steel ${formatNumber(out.quantities.steelLb * KG_PER_LB, 0)} kg · forms ${formatNumber(out.quantities.formFt2 * M2_PER_FT2, 1)} m²`
            : `Concrete ${formatNumber(out.quantities.concreteYd3, 2)} yd³ · steel ${formatNumber(out.quantities.steelLb, 0)} lb · forms ${formatNumber(out.quantities.formFt2, 1)} ft²`}{" "}
          · {out.quantities.ties} ties
          {out.quantities.crossTies ? `, ${out.quantities.crossTies} cross-ties` : ""}
        </p>
        {out.cost ? (
          <table className="mt-2 w-full text-sm" aria-label={`Cost at the price book's units (price book revision ${priceBook?.revision ?? "—"})`}>
            <tbody>
              {out.cost.lines.map((l) => (
                <tr key={`${l.category}-${l.item}`} className="border-b border-stone-100">
                  <td className="py-0.5 pr-2">{l.item}</td>
                  <td className="py-0.5 pr-2 tabular-nums">
                    {formatNumber(l.quantity, 2)} {l.unit.replace("yd3", "yd³").replace("ft2", "ft²")} × ${formatNumber(l.unitPrice, 2)}
                  </td>
                  <td className="py-0.5 text-right tabular-nums">${formatNumber(l.amount, 2)}</td>
                </tr>
              ))}
              <tr>
                <td className="py-1 font-semibold" colSpan={2}>
                  Total per column ({mark.quantity} in the project: ${formatNumber(out.cost.total * mark.quantity, 0)})
                </td>
                <td className="py-1 text-right font-semibold tabular-nums">${formatNumber(out.cost.total, 2)}</td>
              </tr>
            </tbody>
          </table>
        ) : null}
        {out.carbon ? <p className="mt-1">Embodied carbon {formatNumber(out.carbon.total, 0)} kgCO2e per column (concrete {formatNumber(out.carbon.concrete, 0)}, steel {formatNumber(out.carbon.steel, 0)}).</p> : null}
      </section>
    </div>
  );
}
