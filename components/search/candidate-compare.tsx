"use client";
/**
 * Up to four candidates side by side: the section drawn to scale, the cost breakdown, the
 * utilization of every load combination and the interaction diagram with the magnified load
 * points. Each candidate is re-checked with the mark's stored check input and its own design
 * (POST /api/check, POST /api/diagram), so what is shown is the engine's answer, not a copy.
 */
import { useState } from "react";
import { useQueries } from "@tanstack/react-query";
import type { CaseResult, CheckInput, CheckOutput, DiagramResult } from "@/engine/types";
import { callApi } from "@/components/projects/api";
import { formatNumber, formatQuantity, type UnitSystem } from "@/components/projects/units";
import { SectionSketch } from "@/components/section-sketch";
import { InteractionChart, type LoadPoint } from "@/components/interaction-chart";
import type { CandidateRow, PriceBookRecord } from "./search-types";
import { candidateCheckInput, candidateDesign, describeCandidate, formatCarbon, formatDollars } from "./candidate-format";

export interface CandidateCompareProps {
  candidates: CandidateRow[];
  base: CheckInput;
  priceBook: PriceBookRecord | null;
  cover: number;
  units: UnitSystem;
  onRemove: (id: string) => void;
}

function axisPasses(c: CaseResult, axis: "x" | "y"): boolean {
  const a = c[axis];
  if (a.ratio === null || a.ratio > 1 + 1e-9) return false;
  if (a.slender && a.delta === null) return false;
  return !(c.biaxial && c.biaxial.ratio > 1 + 1e-9);
}

export function CandidateCompare({ candidates, base, priceBook, cover, units, onRemove }: CandidateCompareProps) {
  const [axis, setAxis] = useState<"x" | "y">("x");
  const inputs = candidates.map((c) => {
    const design = candidateDesign(c.id, cover);
    return design ? candidateCheckInput(base, design, priceBook) : null;
  });
  const checks = useQueries({
    queries: inputs.map((input, i) => ({
      queryKey: ["candidate-check", candidates[i]?.id, JSON.stringify(input)],
      queryFn: () => callApi<CheckOutput>("/api/check", { method: "POST", body: input }),
      enabled: input !== null,
      staleTime: 5 * 60_000,
    })),
  });
  const diagrams = useQueries({
    queries: inputs.map((input) => ({
      queryKey: ["diagram", JSON.stringify(input?.section), axis],
      queryFn: () => callApi<DiagramResult>("/api/diagram", { method: "POST", body: { section: input?.section, axis, points: 48 } }),
      enabled: input !== null,
      staleTime: 5 * 60_000,
    })),
  });
  if (candidates.length === 0) {
    return <p className="text-sm text-ink-700">Tick up to four candidates in the table (or click their points on the chart) to see them side by side.</p>;
  }
  const caseNames = base.loads.map((l) => l.name);
  const gridCols = ["md:grid-cols-1", "md:grid-cols-2", "md:grid-cols-3", "md:grid-cols-4"][candidates.length - 1] ?? "md:grid-cols-4";

  return (
    <div className="space-y-4" data-testid="comparison">
      <div className={`grid gap-4 ${gridCols}`}>
        {candidates.map((c, i) => {
          const check = checks[i];
          const out = check?.data;
          const input = inputs[i];
          const tie = out?.section.detailing.find((d) => d.rule === "tie-size" || d.rule === "spiral-size");
          return (
            <article key={c.id} className="rounded-md border border-stone-200 p-3" aria-label={`Candidate ${c.id}`} data-testid="compare-card">
              <div className="flex items-start justify-between gap-2">
                <h3 className="font-mono text-xs font-semibold">{c.id}</h3>
                <button type="button" className="text-xs text-oxide-700 underline" onClick={() => onRemove(c.id)} aria-label={`Remove ${c.id} from the comparison`}>
                  remove
                </button>
              </div>
              <p className="mt-1 text-xs text-ink-700">{describeCandidate(c, units)}</p>
              {input ? (
                <div className="mt-2 flex justify-center">
                  <SectionSketch
                    shape={input.section.shape}
                    b={input.section.b}
                    h={input.section.h}
                    D={input.section.D}
                    cover={input.section.cover}
                    bars={out?.section.bars ?? []}
                    tieDb={tie?.value}
                    confinement={input.section.confinement}
                    units={units}
                    width={200}
                    title={`Section of ${c.id}`}
                  />
                </div>
              ) : (
                <p className="text-sm text-strained-600">Not a candidate id this version can read.</p>
              )}
              {check?.isError ? (
                <p role="alert" className="text-sm text-strained-600">
                  The check could not run: {check.error.message}
                </p>
              ) : null}
              {check?.isPending ? <p className="text-sm text-ink-500">Checking…</p> : null}
              {out ? (
                <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm tabular-nums">
                  <dt className="text-ink-500">Utilization</dt>
                  <dd data-testid="compare-utilization">
                    {out.utilization === null ? "unbounded" : formatNumber(out.utilization, 3)} {out.pass ? "✓" : "✗"}
                  </dd>
                  <dt className="text-ink-500">Governing</dt>
                  <dd>{out.governing ?? "—"}</dd>
                  <dt className="text-ink-500">ρ</dt>
                  <dd>{formatNumber(out.section.rho, 4)}</dd>
                  <dt className="text-ink-500">Concrete</dt>
                  <dd>{formatDollars(out.cost?.breakdown.concrete, 2)}</dd>
                  <dt className="text-ink-500">Steel</dt>
                  <dd>{formatDollars(out.cost?.breakdown.steel, 2)}</dd>
                  <dt className="text-ink-500">Formwork</dt>
                  <dd>{formatDollars(out.cost?.breakdown.formwork, 2)}</dd>
                  <dt className="text-ink-500">Bracing</dt>
                  <dd>{formatDollars(out.cost?.breakdown.bracing, 2)}</dd>
                  <dt className="font-semibold">Total</dt>
                  <dd className="font-semibold" data-testid="compare-cost">
                    {formatDollars(out.cost?.total, 2)} per column
                  </dd>
                  <dt className="text-ink-500">Carbon</dt>
                  <dd>{formatCarbon(out.carbon?.total)}</dd>
                  <dt className="text-ink-500">Quantities</dt>
                  <dd className="text-xs">
                    {formatNumber(out.quantities.concreteYd3, 2)} yd³ · {formatNumber(out.quantities.steelLb, 0)} lb · {formatNumber(out.quantities.formFt2, 1)} ft²
                  </dd>
                </dl>
              ) : null}
            </article>
          );
        })}
      </div>

      <section aria-label="Utilization by load combination" className="overflow-x-auto">
        <h3 className="font-semibold">Utilization by load combination</h3>
        <table className="mt-1 w-full border-collapse text-sm" data-testid="compare-cases">
          <thead>
            <tr className="border-b border-stone-200 text-left text-ink-500">
              <th scope="col" className="py-1 pr-3 font-medium">
                Combination
              </th>
              {candidates.map((c) => (
                <th key={c.id} scope="col" className="py-1 pr-3 font-mono text-xs font-medium">
                  {c.id}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {caseNames.map((name) => (
              <tr key={name} className="border-b border-stone-100">
                <th scope="row" className="py-1 pr-3 text-left font-normal">
                  {name}
                </th>
                {candidates.map((c, i) => {
                  const cr = checks[i]?.data?.cases.find((x) => x.name === name);
                  return (
                    <td key={c.id} className={`py-1 pr-3 tabular-nums ${cr && !cr.pass ? "font-semibold text-strained-600" : ""}`}>
                      {cr ? `${cr.utilization === null ? "unbounded" : formatNumber(cr.utilization, 3)}${cr.pass ? "" : " ✗"}` : "…"}
                      {cr ? <span className="block text-xs text-ink-500">δx {formatNumber(cr.x.delta, 2)} · δy {formatNumber(cr.y.delta, 2)}</span> : null}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </section>

      <section aria-label="Interaction diagrams of the compared candidates" className="space-y-2">
        <div className="flex flex-wrap items-center gap-3">
          <h3 className="font-semibold">Interaction diagrams</h3>
          <div role="radiogroup" aria-label="Bending axis" className="flex gap-2 text-sm">
            {(["x", "y"] as const).map((a) => (
              <button key={a} type="button" role="radio" aria-checked={axis === a} className={axis === a ? "btn-primary" : "btn-quiet"} onClick={() => setAxis(a)}>
                about {a}
              </button>
            ))}
          </div>
        </div>
        {/* Two diagrams a row at most: the charts need the width for their legends and axes. */}
        <div className={`grid gap-4 ${candidates.length > 1 ? "md:grid-cols-2" : ""}`}>
          {candidates.map((c, i) => {
            const d = diagrams[i];
            const out = checks[i]?.data;
            const loads: LoadPoint[] = (out?.cases ?? []).map((cr) => ({ name: cr.name, Pu: cr.Pu, firstOrder: cr[axis].M2, magnified: cr[axis].Mc, pass: axisPasses(cr, axis) }));
            if (d?.isError) {
              return (
                <p key={c.id} role="alert" className="text-sm text-strained-600">
                  The diagram of {c.id} could not be drawn: {d.error.message}
                </p>
              );
            }
            return (
              <InteractionChart
                key={c.id}
                axis={axis}
                nominal={(d?.data?.points ?? []).map((p) => ({ M: p.Mn, P: p.Pn }))}
                design={(d?.data?.points ?? []).map((p) => ({ M: p.phiMn, P: p.phiPn }))}
                loads={loads}
                units={units}
                title={c.id}
                height={280}
              />
            );
          })}
        </div>
        <p className="text-xs text-ink-500">
          Moments in {formatQuantity(1, "moment", units).replace(/^1 /, "")}, axial loads in {formatQuantity(1, "force", units).replace(/^1 /, "")}; ○ first-order, ● magnified (Mc).
        </p>
      </section>
    </div>
  );
}
