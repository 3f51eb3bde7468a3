"use client";
/**
 * Form reuse: how total cost changes when the project is limited to N distinct section outlines,
 * the assignment for a chosen N, and adopting it for every mark (estimators propose, engineers approve).
 */
import { useState } from "react";
import { useProject } from "@/components/projects/use-project";
import { ApiError } from "@/components/projects/api";
import { OutlineCostChart } from "./outline-cost-chart";
import { AssignmentTable } from "./assignment-table";
import { useAdoptSet, useSearchMissing, useStandardization, type SweepOptions } from "./use-standardization";

const money = (v: number | null) => (v === null ? "—" : `$${v.toLocaleString("en-US", { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`);

export interface FormReusePanelProps {
  projectId: string;
}

export function FormReusePanel({ projectId }: FormReusePanelProps) {
  const project = useProject(projectId);
  const role = project.data?.role ?? "reviewer";
  const [options, setOptions] = useState<SweepOptions>({ oneFcPerLevel: false, rotatedShareForms: true });
  const [searching, setSearching] = useState(false);
  const query = useStandardization(projectId, options, searching);
  const searchMissing = useSearchMissing(projectId);
  const adopt = useAdoptSet(projectId);
  const [selected, setSelected] = useState<number | null>(null);
  const [comment, setComment] = useState("");

  const sweep = query.data?.sweep ?? [];
  // Until someone picks an N, show the fewest outlines that work.
  const shown = selected ?? sweep.find((s) => s.feasible)?.maxOutlines ?? null;
  const chosen = sweep.find((s) => s.maxOutlines === shown) ?? null;
  const canAdopt = role === "owner" || role === "engineer" || role === "estimator";
  const approves = role === "owner" || role === "engineer";

  return (
    <section aria-labelledby="form-reuse-heading" className="space-y-6">
      <div>
        <h2 id="form-reuse-heading" className="text-xl font-semibold">Form reuse</h2>
        <p className="mt-1 max-w-3xl text-sm text-ink-500">
          Fewer distinct column outlines let the contractor reuse form sets from pour to pour. Each N below is solved as an
          integer program over every mark&apos;s passing alternatives from its latest search: least total cost (each mark&apos;s cost
          × its number of columns, plus {money(query.data?.formSetCost ?? 0)} per form set from the price book) using at most N outlines.
        </p>
      </div>

      <fieldset className="panel flex flex-wrap gap-6 text-sm">
        <legend className="sr-only">Options</legend>
        <label className="flex items-center gap-2">
          <input type="checkbox" checked={options.oneFcPerLevel} onChange={(e) => setOptions({ ...options, oneFcPerLevel: e.target.checked })} />
          One f&apos;c per level
        </label>
        <label className="flex items-center gap-2">
          <input type="checkbox" checked={options.rotatedShareForms} onChange={(e) => setOptions({ ...options, rotatedShareForms: e.target.checked })} />
          b × h and h × b share a form set
        </label>
      </fieldset>

      {query.isLoading ? <p className="text-sm text-ink-500">Solving…</p> : null}
      {query.error ? <p role="alert" className="field-error">{query.error.message}</p> : null}

      {query.data && query.data.missing.length > 0 ? (
        <div role="status" className="panel border-oxide-500/40">
          <p className="text-sm">
            <strong>{query.data.missing.length} mark(s) have no finished search yet:</strong> {query.data.missing.map((m) => m.label).join(", ")}.
            They are left out until their searches finish.
          </p>
          {canAdopt ? (
            <button
              type="button"
              className="btn-primary mt-3"
              disabled={searchMissing.isPending || searching}
              onClick={() => searchMissing.mutate(undefined, { onSuccess: () => setSearching(true) })}
            >
              {searching ? "Searching the missing marks…" : "Search the missing marks"}
            </button>
          ) : null}
          {searchMissing.data?.skipped.length ? (
            <ul className="mt-2 text-sm text-strained-600">
              {searchMissing.data.skipped.map((s) => (
                <li key={s.label}>{s.label}: {s.reason}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}

      {query.data && query.data.stale.length > 0 ? (
        <p className="text-sm text-strained-600">
          Stale searches (loads, lengths or prices changed since): {query.data.stale.map((m) => m.label).join(", ")}. Search them again before adopting.
        </p>
      ) : null}

      {sweep.length > 0 ? (
        <div className="panel">
          <OutlineCostChart sweep={sweep} selected={shown ?? 0} onSelect={setSelected} />
          <ol className="mt-3 flex flex-wrap gap-2 text-sm" aria-label="Number of distinct outlines">
            {sweep.map((s) => (
              <li key={s.maxOutlines}>
                <button
                  type="button"
                  aria-pressed={s.maxOutlines === shown}
                  className={s.maxOutlines === shown ? "btn-primary" : "btn-quiet"}
                  onClick={() => setSelected(s.maxOutlines)}
                >
                  N = {s.maxOutlines}: {s.feasible ? money(s.totalCost) : "no assignment"}
                </button>
              </li>
            ))}
          </ol>
        </div>
      ) : query.data && query.data.missing.length === 0 ? (
        <p className="text-sm text-ink-500">Add column marks and run their searches to compare outline counts.</p>
      ) : null}

      {chosen ? (
        <div className="panel space-y-4">
          <h3 className="text-lg font-semibold">N = {chosen.maxOutlines}</h3>
          {chosen.feasible ? (
            <>
              <dl className="grid grid-cols-2 gap-3 text-sm md:grid-cols-4">
                <div><dt className="text-ink-500">Total</dt><dd className="font-semibold">{money(chosen.totalCost)}</dd></div>
                <div><dt className="text-ink-500">Columns</dt><dd>{money(chosen.columnsCost)}</dd></div>
                <div><dt className="text-ink-500">Form sets</dt><dd>{money(chosen.formSetsCost)}</dd></div>
                <div><dt className="text-ink-500">Outlines used</dt><dd>{chosen.outlines.map((o) => o.key).join(", ")}</dd></div>
              </dl>
              <AssignmentTable rows={chosen.assignment} />
              {canAdopt ? (
                <div className="space-y-2 border-t border-stone-200 pt-4">
                  <label className="field-label" htmlFor="adopt-comment">Comment for the team</label>
                  <textarea id="adopt-comment" className="field-input" rows={2} maxLength={2000} value={comment} onChange={(e) => setComment(e.target.value)} />
                  <button
                    type="button"
                    className="btn-primary"
                    disabled={adopt.isPending}
                    onClick={() => adopt.mutate({ ...options, maxOutlines: chosen.maxOutlines, comment })}
                  >
                    {approves ? `Adopt this set for all ${chosen.assignment.length} marks` : `Propose this set for all ${chosen.assignment.length} marks`}
                  </button>
                  {adopt.data ? (
                    <p role="status" className="text-sm text-sound-600">
                      {approves ? "Adopted" : "Proposed"}: {adopt.data.adopted.map((a) => `${a.label} → ${a.candidateId}`).join("; ")}
                    </p>
                  ) : null}
                  {adopt.error ? (
                    <p role="alert" className="field-error">
                      {adopt.error.message}
                      {adopt.error instanceof ApiError ? adopt.error.issues.map((i) => ` ${i.message}`).join(";") : ""}
                    </p>
                  ) : null}
                </div>
              ) : null}
            </>
          ) : (
            <p className="text-sm text-strained-600">No assignment: {chosen.reasons.join("; ")}</p>
          )}
          <ul className="list-disc pl-5 text-xs text-ink-500">
            {chosen.assumptions.map((a) => (
              <li key={a}>{a}</li>
            ))}
            <li>Solved by {chosen.stats.method} in {chosen.stats.ms.toFixed(0)} ms{chosen.stats.optimal ? ", proven optimal" : ", best found within the time limit"}.</li>
          </ul>
        </div>
      ) : null}

      <p className="text-xs text-ink-500">{query.data?.codeEdition ?? "ACI 318-19"} · {query.data?.caution}</p>
    </section>
  );
}
