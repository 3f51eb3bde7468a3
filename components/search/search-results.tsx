"use client";
/**
 * The results of one search: the front chart (cost vs utilization, or carbon vs cost) with the
 * current design and the cheapest passing candidate marked, the candidate table with filters, the
 * side-by-side comparison of up to four candidates, proposing one for the mark, the mark's
 * proposals, and — always — the code edition, the assumptions and the caution.
 */
import Link from "next/link";
import { useCallback, useEffect, useId, useState } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { CheckOutput } from "@/engine/types";
import { callApi } from "@/components/projects/api";
import { QueryBoundary } from "@/components/projects/query-boundary";
import { useProject } from "@/components/projects/use-project";
import { formatNumber } from "@/components/projects/units";
import type { CheckInputResponse } from "@/components/marks/mark-types";
import { AlternativesPanel, alternativesKey } from "@/components/alternatives/alternatives-panel";
import { CAUTION } from "@/lib/caution";
import { SearchProgress, searchKey } from "./search-progress";
import { FrontChart, type FrontView } from "./front-chart";
import { CandidateTable, MAX_COMPARED } from "./candidate-table";
import { CandidateCompare } from "./candidate-compare";
import { describeCandidate, formatCarbon, formatDollars } from "./candidate-format";
import { isActive, roleCan, type CandidatesResponse, type CandidateRow, type MarkResponse, type SearchView } from "./search-types";

export interface SearchResultsProps {
  workspaceId: string;
  projectId: string;
  markId: string;
  searchId: string;
}

export function SearchResults(props: SearchResultsProps) {
  return (
    <QueryBoundary>
      <SearchResultsInner {...props} />
    </QueryBoundary>
  );
}

/** The comparison survives a reload: it lives in the address (?compare=id,id). */
function readCompared(): string[] {
  if (typeof window === "undefined") return [];
  const raw = new URLSearchParams(window.location.search).get("compare");
  return raw ? raw.split(",").filter(Boolean).slice(0, MAX_COMPARED) : [];
}

function SearchResultsInner({ workspaceId, projectId, markId, searchId }: SearchResultsProps) {
  const queryClient = useQueryClient();
  const markQuery = useQuery({ queryKey: ["mark", markId], queryFn: () => callApi<MarkResponse>(`/api/marks/${markId}`) });
  const project = useProject(projectId);
  const search = useQuery({
    queryKey: searchKey(searchId),
    queryFn: () => callApi<{ search: SearchView }>(`/api/searches/${searchId}`).then((r) => r.search),
    refetchInterval: (q) => (q.state.data && isActive(q.state.data.status) ? 500 : false),
  });
  const done = search.data?.status === "done";
  const candidates = useQuery({
    queryKey: ["candidates", searchId],
    queryFn: () => callApi<CandidatesResponse>(`/api/searches/${searchId}/candidates`),
    enabled: done,
    staleTime: Infinity,
  });
  const source = useQuery({ queryKey: ["check-input", markId], queryFn: () => callApi<CheckInputResponse>(`/api/marks/${markId}/check-input`) });
  const input = source.data?.input;
  const current = useQuery({
    queryKey: ["check", JSON.stringify(input)],
    queryFn: () => callApi<CheckOutput>("/api/check", { method: "POST", body: input }),
    enabled: Boolean(input) && (input?.loads.length ?? 0) > 0,
  });
  const [view, setView] = useState<FrontView>("cost");
  const [selected, setSelected] = useState<string[]>(readCompared);
  useEffect(() => {
    const url = new URL(window.location.href);
    if (selected.length > 0) url.searchParams.set("compare", selected.join(","));
    else url.searchParams.delete("compare");
    window.history.replaceState(window.history.state, "", url.toString());
  }, [selected]);
  const loaded = candidates.data?.candidates;
  const toggle = useCallback(
    (id: string) => {
      setSelected((all) => {
        const s = loaded ? all.filter((x) => loaded.some((c) => c.id === x)) : all;
        return s.includes(id) ? s.filter((x) => x !== id) : s.length >= MAX_COMPARED ? s : [...s, id];
      });
    },
    [loaded],
  );

  if (markQuery.isPending || project.isPending || search.isPending) return <p className="text-ink-500">Loading the search…</p>;
  if (markQuery.isError) return <p role="alert">The mark could not be loaded: {markQuery.error.message}</p>;
  if (project.isError) return <p role="alert">The project could not be loaded: {project.error.message}</p>;
  if (search.isError) return <p role="alert">The search could not be loaded: {search.error.message}</p>;
  const { mark, role } = markQuery.data;
  const { project: proj, priceBook } = project.data;
  const units = proj.units;
  const s = search.data;
  const stats = s.stats ?? {};
  const base = `/w/${workspaceId}/projects/${projectId}/marks/${markId}`;
  const rows = candidates.data?.candidates ?? [];
  const bestId = stats.best ?? rows[0]?.id ?? null;
  const best = rows.find((r) => r.id === bestId) ?? null;
  const compared = selected.map((id) => rows.find((r) => r.id === id)).filter((r): r is CandidateRow => r !== undefined);
  // Ids from an old address that are not in this search's results do not count against the four.
  const comparedIds = compared.map((c) => c.id);
  const cur = current.data;
  const a = stats.assumptions ?? {};

  return (
    <div className="space-y-6">
      <div>
        <p className="no-print text-sm">
          <Link href={`${base}/searches`} className="text-oxide-700 underline">
            ← Searches of mark {mark.label}
          </Link>
        </p>
        <h2 className="text-xl font-semibold">
          Search results — mark {mark.label}
          {mark.level ? <span className="font-normal text-ink-500"> · {mark.level}</span> : null}
        </h2>
        <p className="text-sm text-ink-700">
          Started {new Date(s.createdAt).toLocaleString("en-US", { dateStyle: "medium", timeStyle: "short" })}
          {stats.candidates !== undefined ? ` · ${formatNumber(stats.candidates, 0)} candidates in the space, ${formatNumber(stats.fullChecks ?? 0, 0)} member checks, ${formatNumber(stats.passing ?? 0, 0)} passing, ${formatNumber((stats.ms ?? 0) / 1000, 1)} s on ${stats.threads ?? 1} thread${(stats.threads ?? 1) > 1 ? "s" : ""}` : ""}
          {s.stale ? (
            <span className="ml-2 rounded border border-strained-600 px-2 py-0.5 text-xs font-semibold text-strained-600" data-testid="search-stale">
              stale: the mark&apos;s inputs changed since this search ran
            </span>
          ) : null}
        </p>
      </div>

      {!done ? (
        <div className="panel">
          <SearchProgress search={s} canCancel={roleCan(role, "runSearch")} onSettled={() => void queryClient.invalidateQueries({ queryKey: ["searches", markId] })} />
          {s.status === "cancelled" ? <p className="mt-2 text-sm">This search was cancelled; it kept no results. Start another from the searches page.</p> : null}
        </div>
      ) : null}

      <section aria-label="Assumptions" className="panel text-sm" data-testid="assumptions">
        <h2 className="font-semibold">Basis and assumptions</h2>
        <p className="mt-1">
          Code edition: {a.code ?? proj.codeBasis} · EI option ({a.ei ?? proj.eiOption}), 6.6.4.4.4 · {a.braced === false ? "sway frame" : "braced (nonsway) frame"} · kx = {formatNumber(a.kx ?? null, 3)}, ky ={" "}
          {formatNumber(a.ky ?? null, 3)} · ρmax {formatNumber(a.rhoMax ?? null, 3)} · exposure {a.exposure ?? proj.exposure}
          {input ? ` · βdns ${input.loads.map((l) => `${l.name} ${formatNumber(l.betaDns, 2)}`).join(", ")}` : ""}
        </p>
        {(a.notes ?? []).length > 0 ? (
          <ul className="mt-1 list-disc pl-5 text-xs text-ink-700">
            {(a.notes ?? []).map((n) => (
              <li key={n}>{n}</li>
            ))}
          </ul>
        ) : null}
        <p className="mt-2 border-t border-stone-200 pt-2 text-xs text-ink-700" data-testid="caution">
          {a.caution ?? CAUTION}
        </p>
      </section>

      {done && candidates.isPending ? <p className="text-ink-500">Loading the candidates…</p> : null}
      {candidates.isError ? <p role="alert">The candidates could not be loaded: {candidates.error.message}</p> : null}
      {done && candidates.isSuccess && rows.length === 0 ? (
        <section className="panel" aria-label="Nothing passes">
          <h2 className="font-semibold text-strained-600">No candidate in this space passes.</h2>
          <ul className="mt-2 list-disc pl-5 text-sm">
            {(stats.rejected ?? []).map((r) => (
              <li key={r.region}>{r.reason}</li>
            ))}
          </ul>
          <p className="mt-2 text-sm">Widen the space (larger outlines, stronger concrete, more brace levels) and search again.</p>
        </section>
      ) : null}

      {rows.length > 0 ? (
        <>
          <section aria-label="Summary" className="grid gap-4 md:grid-cols-2">
            <div className="panel text-sm" data-testid="best-summary">
              <h2 className="font-semibold">Cheapest passing candidate</h2>
              {best ? (
                <>
                  <p className="mt-1 font-mono text-xs">{best.id}</p>
                  <p>{describeCandidate(best, units)}</p>
                  <p className="tabular-nums">
                    {formatDollars(best.cost, 2)} per column · utilization {formatNumber(best.utilization, 3)} · {formatCarbon(best.carbon)}
                  </p>
                </>
              ) : null}
            </div>
            <div className="panel text-sm" data-testid="current-summary">
              <h2 className="font-semibold">Current design</h2>
              {cur ? (
                <p className={cur.pass ? "text-sound-600" : "text-strained-600"}>
                  {cur.pass ? "✓ passes" : "✗ fails"}: utilization {cur.utilization === null ? "unbounded" : formatNumber(cur.utilization, 3)}
                  {cur.cost ? `, ${formatDollars(cur.cost.total, 2)} per column` : ""}
                  {cur.carbon ? `, ${formatCarbon(cur.carbon.total)}` : ""}
                </p>
              ) : (
                <p className="text-ink-500">{current.isError ? `could not be checked: ${current.error.message}` : "checking…"}</p>
              )}
              {cur && best && cur.cost ? (
                <p className="mt-1 text-ink-700">
                  The cheapest passing candidate {best.cost <= cur.cost.total ? "saves" : "costs"} {formatDollars(Math.abs(cur.cost.total - best.cost), 2)} per column ({formatDollars(Math.abs(cur.cost.total - best.cost) * mark.quantity, 0)} over the {mark.quantity}{" "}
                  column{mark.quantity > 1 ? "s" : ""} of this mark) {best.cost <= cur.cost.total ? "against" : "more than"} the current design.
                </p>
              ) : null}
            </div>
          </section>

          <section aria-label="Front" className="panel">
            <h2 className="font-semibold">The front</h2>
            <FrontChart
              candidates={rows}
              view={view}
              onViewChange={setView}
              bestId={bestId}
              carbonFront={stats.carbonFront ?? []}
              current={cur ? { label: mark.label, cost: cur.cost?.total ?? null, carbon: cur.carbon?.total ?? null, utilization: cur.utilization, pass: cur.pass } : null}
              selected={comparedIds}
              onToggle={toggle}
            />
          </section>

          <section aria-label="Candidates" className="panel">
            <h2 className="mb-2 font-semibold">Passing candidates</h2>
            <CandidateTable candidates={rows} units={units} bestId={bestId} selected={comparedIds} onToggle={toggle} />
          </section>

          <section aria-label="Comparison" className="panel">
            <h2 className="mb-2 font-semibold">Side by side</h2>
            {input ? (
              <CandidateCompare candidates={compared} base={input} priceBook={priceBook} cover={proj.cover} units={units} onRemove={toggle} />
            ) : (
              <p className="text-ink-500">Loading the mark&apos;s check input…</p>
            )}
          </section>

          {roleCan(role, "proposeAlternative") ? (
            <ProposeForm
              markId={markId}
              searchId={searchId}
              choices={compared.length > 0 ? compared : best ? [best] : []}
              units={units}
              onProposed={() => void queryClient.invalidateQueries({ queryKey: alternativesKey(markId) })}
            />
          ) : null}
        </>
      ) : null}

      <AlternativesPanel workspaceId={workspaceId} projectId={projectId} markId={markId} role={role} units={units} />
    </div>
  );
}

function ProposeForm({ markId, searchId, choices, units, onProposed }: { markId: string; searchId: string; choices: CandidateRow[]; units: "US" | "SI"; onProposed: () => void }) {
  const id = useId();
  const [candidateId, setCandidateId] = useState<string>("");
  const [comment, setComment] = useState("");
  const chosen = choices.some((c) => c.id === candidateId) ? candidateId : (choices[0]?.id ?? "");
  const propose = useMutation({
    mutationFn: () => callApi(`/api/marks/${markId}/alternatives`, { method: "POST", body: { searchId, candidateId: chosen, comment } }),
    onSuccess: () => {
      setComment("");
      onProposed();
    },
  });
  if (choices.length === 0) return null;
  return (
    <form
      className="panel space-y-3"
      aria-labelledby={`${id}-title`}
      onSubmit={(e) => {
        e.preventDefault();
        propose.mutate();
      }}
    >
      <h2 id={`${id}-title`} className="font-semibold">
        Propose for this mark
      </h2>
      <p className="text-sm text-ink-700">An engineer approves or turns down the proposal; the team is e-mailed either way. Approval makes it the mark&apos;s design.</p>
      <div>
        <label htmlFor={`${id}-candidate`} className="field-label">
          Candidate
        </label>
        <select id={`${id}-candidate`} className="field-input" value={chosen} onChange={(e) => setCandidateId(e.target.value)}>
          {choices.map((c) => (
            <option key={c.id} value={c.id}>
              {c.id} — {describeCandidate(c, units)} — {formatDollars(c.cost, 2)}
            </option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor={`${id}-comment`} className="field-label">
          Comment for the engineer
        </label>
        <textarea id={`${id}-comment`} className="field-input" rows={2} maxLength={2000} value={comment} onChange={(e) => setComment(e.target.value)} />
      </div>
      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" className="btn-primary" disabled={propose.isPending || !chosen}>
          {propose.isPending ? "Proposing…" : "Propose"}
        </button>
        {propose.isSuccess ? (
          <span role="status" className="text-sm text-sound-600">
            Proposed {chosen}; the engineers have been e-mailed.
          </span>
        ) : null}
        {propose.isError ? (
          <span role="alert" className="text-sm text-strained-600">
            {propose.error.message}
          </span>
        ) : null}
      </div>
    </form>
  );
}
