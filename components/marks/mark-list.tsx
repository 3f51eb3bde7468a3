"use client";
/**
 * The project's column marks with their current design and, once checked, the verdict with
 * slenderness included. Each mark's check runs through the same POST /api/check as the check view.
 */
import Link from "next/link";
import { useQueries, useQuery } from "@tanstack/react-query";
import { callApi } from "@/components/projects/api";
import { QueryBoundary } from "@/components/projects/query-boundary";
import { useProject } from "@/components/projects/use-project";
import { formatNumber, formatQuantity, type UnitSystem } from "@/components/projects/units";
import { describeSection, type CheckInputResponse, type CheckOutput, type MarkRecord } from "./mark-types";

export interface MarkListProps {
  workspaceId: string;
  projectId: string;
}

export function MarkList(props: MarkListProps) {
  return (
    <QueryBoundary>
      <MarkListInner {...props} />
    </QueryBoundary>
  );
}

async function checkMark(markId: string): Promise<CheckOutput | null> {
  const source = await callApi<CheckInputResponse>(`/api/marks/${markId}/check-input`);
  if (source.input.loads.length === 0) return null;
  return callApi<CheckOutput>("/api/check", { method: "POST", body: source.input });
}

function MarkListInner({ workspaceId, projectId }: MarkListProps) {
  const project = useProject(projectId);
  const marks = useQuery({ queryKey: ["marks", projectId], queryFn: () => callApi<{ marks: MarkRecord[] }>(`/api/projects/${projectId}/marks`) });
  const checks = useQueries({
    queries: (marks.data?.marks ?? []).map((m) => ({
      queryKey: ["mark-verdict", m.id, m.version, m.updatedAt],
      queryFn: () => checkMark(m.id),
      staleTime: 60_000,
    })),
  });
  if (marks.isPending || project.isPending) return <p className="text-ink-500">Loading column marks…</p>;
  if (marks.isError) return <p role="alert">Column marks could not be loaded: {marks.error.message}</p>;
  if (project.isError) return <p role="alert">The project could not be loaded: {project.error.message}</p>;
  const units: UnitSystem = project.data.project.units;
  const base = `/w/${workspaceId}/projects/${projectId}`;
  const list = marks.data.marks;

  return (
    <section aria-labelledby="marks-heading" className="space-y-3">
      <div className="flex items-center justify-between">
        <h2 id="marks-heading" className="text-lg font-semibold">
          Column marks
        </h2>
        {project.data.can.editMarks ? (
          <Link href={`${base}/marks/new`} className="btn-primary no-print">
            Add a column mark
          </Link>
        ) : null}
      </div>
      {list.length === 0 ? (
        <div className="panel text-ink-700">
          <p className="font-medium">No column marks yet.</p>
          <p className="mt-1">
            {project.data.can.editMarks
              ? "Add a mark (its unbraced length, restraint and current section), then enter or upload its load combinations — or upload one CSV with the loads of several marks below once the marks exist."
              : "Owners and engineers add column marks; they will be listed here."}
          </p>
        </div>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full border-collapse text-sm">
            <caption className="sr-only">Column marks with their current design and verdict</caption>
            <thead>
              <tr className="border-b border-stone-200 text-left text-ink-500">
                <th className="py-2 pr-3 font-medium">Mark</th>
                <th className="py-2 pr-3 font-medium">Level</th>
                <th className="py-2 pr-3 text-right font-medium">No.</th>
                <th className="py-2 pr-3 font-medium">ℓu</th>
                <th className="py-2 pr-3 font-medium">Frame</th>
                <th className="py-2 pr-3 font-medium">Current design</th>
                <th className="py-2 pr-3 text-right font-medium">Load combinations</th>
                <th className="py-2 font-medium">Verdict (slenderness included)</th>
              </tr>
            </thead>
            <tbody>
              {list.map((m, i) => {
                const check = checks[i];
                const out = check?.data;
                return (
                  <tr key={m.id} className="border-b border-stone-100">
                    <td className="py-2 pr-3">
                      <Link href={`${base}/marks/${m.id}`} className="font-medium text-oxide-700 hover:underline">
                        {m.label}
                      </Link>
                    </td>
                    <td className="py-2 pr-3">{m.level || "—"}</td>
                    <td className="py-2 pr-3 text-right tabular-nums">{m.quantity}</td>
                    <td className="py-2 pr-3 tabular-nums">{formatQuantity(m.member.lu, "length", units)}</td>
                    <td className="py-2 pr-3">{m.member.braced ? "braced" : "sway"}</td>
                    <td className="py-2 pr-3">
                      {describeSection(m.design.section, units)}
                      {m.design.braceLevels > 0 ? ` · ${m.design.braceLevels} brace level${m.design.braceLevels > 1 ? "s" : ""}` : ""}
                    </td>
                    <td className="py-2 pr-3 text-right tabular-nums">{m.loads ?? 0}</td>
                    <td className="py-2" data-testid={`verdict-${m.label}`}>
                      {check?.isPending ? (
                        <span className="text-ink-500">checking…</span>
                      ) : check?.isError ? (
                        <span className="text-strained-600">check not run: {check.error.message}</span>
                      ) : out === null || out === undefined ? (
                        <span className="text-ink-500">no load combinations</span>
                      ) : (
                        <Link href={`${base}/marks/${m.id}/check`} className={out.pass ? "text-sound-600 hover:underline" : "font-semibold text-strained-600 hover:underline"}>
                          {out.pass ? "✓ passes" : "✗ fails"} · utilization {out.utilization === null ? "unbounded" : formatNumber(out.utilization, 2)}
                        </Link>
                      )}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
