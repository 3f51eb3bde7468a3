"use client";
/**
 * The project's column schedule: one row per mark with the design it carries (the adopted
 * alternative, when there is one), its live utilization, quantities and cost, then totals by cost
 * category and by level; the CSV and the calculation package (PDF) as downloads.
 * Figures are the server's (GET /api/projects/{id}/schedule), in US units as it states.
 */
import Link from "next/link";
import { useQuery } from "@tanstack/react-query";
import type { Schedule, ScheduleRow } from "@/lib/schedule/build-schedule";
import { callApi } from "@/components/projects/api";
import { QueryBoundary } from "@/components/projects/query-boundary";
import { formatNumber } from "@/components/projects/units";
import { formatDollars } from "@/components/search/candidate-format";

export interface ScheduleViewProps {
  workspaceId: string;
  projectId: string;
}

export function ScheduleView(props: ScheduleViewProps) {
  return (
    <QueryBoundary>
      <ScheduleInner {...props} />
    </QueryBoundary>
  );
}

function AdoptionCell({ row, href }: { row: ScheduleRow; href: string }) {
  const a = row.adoption;
  if (!a) return <span className="text-ink-500">none adopted</span>;
  return (
    <span className="space-x-1">
      <Link href={href} className="font-mono text-xs text-oxide-700 underline">
        {a.candidateId}
      </Link>
      {a.stale ? <span className="rounded border border-strained-600 px-1 text-xs font-semibold text-strained-600">stale</span> : null}
      {!a.matchesDesign ? <span className="text-xs text-ink-500">(the mark now carries another design)</span> : null}
    </span>
  );
}

function ScheduleInner({ workspaceId, projectId }: ScheduleViewProps) {
  const schedule = useQuery({ queryKey: ["schedule", projectId], queryFn: () => callApi<Schedule>(`/api/projects/${projectId}/schedule`) });
  const csvHref = `/api/projects/${projectId}/schedule?format=csv`;
  const pdfHref = `/api/projects/${projectId}/package`;
  const markBase = `/w/${workspaceId}/projects/${projectId}/marks`;
  const downloads = (
    <div className="no-print flex flex-wrap gap-3">
      <a href={csvHref} className="btn-quiet" download>
        Download CSV
      </a>
      <a href={pdfHref} className="btn-quiet" download>
        Download calculation package (PDF)
      </a>
    </div>
  );
  if (schedule.isPending) return <p className="text-ink-500">Building the column schedule…</p>;
  if (schedule.isError)
    return (
      <div className="space-y-3">
        <p role="alert">The schedule could not be built: {schedule.error.message}</p>
        {downloads}
      </div>
    );
  const s = schedule.data;
  const t = s.totals;
  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 className="text-xl font-semibold">Column schedule</h2>
          <p className="text-sm text-ink-700">
            {s.codeEdition} · every design checked now with slenderness · prices from {s.priceBookRevision === null ? "no price book (no costs)" : `price book revision ${s.priceBookRevision}`} · quantities in yd³, lb and ft², costs in $
          </p>
        </div>
        {downloads}
      </div>

      {s.rows.length === 0 ? (
        <p className="panel text-sm">
          The project has no column marks yet. <Link href={`/w/${workspaceId}/projects/${projectId}`} className="text-oxide-700 underline">Add a mark</Link> and it appears here.
        </p>
      ) : (
        <section aria-label="Schedule" className="panel overflow-x-auto">
          <table className="w-full border-collapse text-sm" data-testid="schedule-table">
            <thead>
              <tr className="border-b border-stone-200 text-left text-ink-500">
                <th scope="col" className="py-1 pr-3 font-medium">Mark</th>
                <th scope="col" className="py-1 pr-3 font-medium">Level</th>
                <th scope="col" className="py-1 pr-3 font-medium">No. of columns</th>
                <th scope="col" className="py-1 pr-3 font-medium">Design</th>
                <th scope="col" className="py-1 pr-3 font-medium">Utilization</th>
                <th scope="col" className="py-1 pr-3 font-medium">Adopted alternative</th>
                <th scope="col" className="py-1 pr-3 text-right font-medium">Concrete (yd³)</th>
                <th scope="col" className="py-1 pr-3 text-right font-medium">Steel (lb)</th>
                <th scope="col" className="py-1 pr-3 text-right font-medium">Forms (ft²)</th>
                <th scope="col" className="py-1 pr-3 text-right font-medium">Cost per column ($)</th>
                <th scope="col" className="py-1 text-right font-medium">Cost, all columns ($)</th>
              </tr>
            </thead>
            <tbody>
              {s.rows.map((r) => (
                <tr key={r.markId} className="border-b border-stone-100 align-top" data-testid="schedule-row" data-mark={r.label}>
                  <th scope="row" className="py-1 pr-3 text-left font-medium">
                    <Link href={`${markBase}/${r.markId}`} className="text-oxide-700 underline">
                      {r.label}
                    </Link>
                    <a href={`/api/marks/${r.markId}/package`} className="block text-xs font-normal text-oxide-700 underline" download aria-label={`Calculation package of ${r.label} (PDF)`}>
                      PDF
                    </a>
                  </th>
                  <td className="py-1 pr-3">{r.level || "—"}</td>
                  <td className="py-1 pr-3 tabular-nums">{r.quantity}</td>
                  <td className="py-1 pr-3">{r.design}</td>
                  <td className={`py-1 pr-3 tabular-nums ${r.pass ? "" : "font-semibold text-strained-600"}`} title={r.reasons.join(" ")}>
                    {r.utilization === null ? "—" : formatNumber(r.utilization, 3)} {r.pass ? "✓" : "✗ fails"}
                    {r.governing ? <span className="block text-xs font-normal text-ink-500">{r.governing}</span> : null}
                  </td>
                  <td className="py-1 pr-3">
                    <AdoptionCell row={r} href={`${markBase}/${r.markId}/alternatives`} />
                  </td>
                  <td className="py-1 pr-3 text-right tabular-nums">{formatNumber(r.quantities?.extended.concreteYd3, 2)}</td>
                  <td className="py-1 pr-3 text-right tabular-nums">{formatNumber(r.quantities?.extended.steelLb, 1)}</td>
                  <td className="py-1 pr-3 text-right tabular-nums">{formatNumber(r.quantities?.extended.formFt2, 1)}</td>
                  <td className="py-1 pr-3 text-right tabular-nums">{formatDollars(r.cost?.perColumn.total, 2)}</td>
                  <td className="py-1 text-right tabular-nums">{formatDollars(r.cost?.extended.total, 2)}</td>
                </tr>
              ))}
            </tbody>
            <tfoot>
              <tr className="border-t-2 border-stone-300 font-semibold">
                <th scope="row" className="py-1 pr-3 text-left" colSpan={2}>
                  Project
                </th>
                <td className="py-1 pr-3 tabular-nums">{t.grand.columns}</td>
                <td className="py-1 pr-3 font-normal" colSpan={3}>
                  {t.grand.marks} marks{t.grand.notPassing > 0 ? `, ${t.grand.notPassing} not passing` : ", all passing"}
                  {t.unpricedMarks > 0 ? `, ${t.unpricedMarks} without a cost` : ""}
                </td>
                <td className="py-1 pr-3 text-right tabular-nums">{formatNumber(t.grand.concreteYd3, 2)}</td>
                <td className="py-1 pr-3 text-right tabular-nums">{formatNumber(t.grand.steelLb, 1)}</td>
                <td className="py-1 pr-3 text-right tabular-nums">{formatNumber(t.grand.formFt2, 1)}</td>
                <td className="py-1 pr-3" />
                <td className="py-1 text-right tabular-nums" data-testid="schedule-grand-total">
                  {formatDollars(t.grand.cost.total, 2)}
                </td>
              </tr>
            </tfoot>
          </table>
        </section>
      )}

      {s.rows.length > 0 ? (
        <div className="grid gap-6 lg:grid-cols-[1fr_2fr]">
          <section aria-label="Totals by category" className="panel">
            <h2 className="font-semibold">Totals by cost category</h2>
            <table className="mt-2 w-full text-sm" data-testid="totals-by-category">
              <tbody>
                {(["concrete", "steel", "formwork", "bracing"] as const).map((k) => (
                  <tr key={k} className="border-b border-stone-100">
                    <th scope="row" className="py-1 pr-3 text-left font-normal capitalize">
                      {k}
                    </th>
                    <td className="py-1 text-right tabular-nums">{formatDollars(t.byCategory[k], 2)}</td>
                  </tr>
                ))}
                <tr className="font-semibold">
                  <th scope="row" className="py-1 pr-3 text-left">
                    Total
                  </th>
                  <td className="py-1 text-right tabular-nums">{formatDollars(t.byCategory.total, 2)}</td>
                </tr>
              </tbody>
            </table>
          </section>
          <section aria-label="Totals by level" className="panel overflow-x-auto">
            <h2 className="font-semibold">Totals by level</h2>
            <table className="mt-2 w-full text-sm" data-testid="totals-by-level">
              <thead>
                <tr className="border-b border-stone-200 text-left text-ink-500">
                  <th scope="col" className="py-1 pr-3 font-medium">Level</th>
                  <th scope="col" className="py-1 pr-3 text-right font-medium">Marks</th>
                  <th scope="col" className="py-1 pr-3 text-right font-medium">Columns</th>
                  <th scope="col" className="py-1 pr-3 text-right font-medium">Concrete (yd³)</th>
                  <th scope="col" className="py-1 pr-3 text-right font-medium">Steel (lb)</th>
                  <th scope="col" className="py-1 pr-3 text-right font-medium">Forms (ft²)</th>
                  <th scope="col" className="py-1 text-right font-medium">Cost ($)</th>
                </tr>
              </thead>
              <tbody>
                {t.byLevel.map((l) => (
                  <tr key={l.level} className="border-b border-stone-100">
                    <th scope="row" className="py-1 pr-3 text-left font-normal">
                      {l.level || "(no level)"}
                    </th>
                    <td className="py-1 pr-3 text-right tabular-nums">{l.marks}</td>
                    <td className="py-1 pr-3 text-right tabular-nums">{l.columns}</td>
                    <td className="py-1 pr-3 text-right tabular-nums">{formatNumber(l.concreteYd3, 2)}</td>
                    <td className="py-1 pr-3 text-right tabular-nums">{formatNumber(l.steelLb, 1)}</td>
                    <td className="py-1 pr-3 text-right tabular-nums">{formatNumber(l.formFt2, 1)}</td>
                    <td className="py-1 text-right tabular-nums">{formatDollars(l.cost.total, 2)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </section>
        </div>
      ) : null}
    </div>
  );
}
