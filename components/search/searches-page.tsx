"use client";
/**
 * A mark's alternatives search: the space form (for the roles that may run searches), the mark's
 * searches newest first with live progress, and the proposals and adopted alternatives of the mark.
 */
import Link from "next/link";
import { useState } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { callApi, issuesByPath } from "@/components/projects/api";
import { QueryBoundary } from "@/components/projects/query-boundary";
import { useProject } from "@/components/projects/use-project";
import { formatNumber } from "@/components/projects/units";
import { describeSection } from "@/components/marks/mark-types";
import { AlternativesPanel } from "@/components/alternatives/alternatives-panel";
import { SearchProgress, useLiveSearch } from "./search-progress";
import { SpaceForm, defaultSpace, toRequestSpace, type SpaceChoice } from "./space-form";
import { roleCan, type MarkResponse, type SearchView } from "./search-types";

export interface SearchesPageProps {
  workspaceId: string;
  projectId: string;
  markId: string;
}

export const searchesKey = (markId: string) => ["searches", markId] as const;

export function SearchesPage(props: SearchesPageProps) {
  return (
    <QueryBoundary>
      <SearchesPageInner {...props} />
    </QueryBoundary>
  );
}

function formatWhen(iso: string | null): string {
  if (!iso) return "—";
  return new Date(iso).toLocaleString("en-US", { dateStyle: "medium", timeStyle: "short" });
}

function SearchesPageInner({ workspaceId, projectId, markId }: SearchesPageProps) {
  const queryClient = useQueryClient();
  const markQuery = useQuery({ queryKey: ["mark", markId], queryFn: () => callApi<MarkResponse>(`/api/marks/${markId}`) });
  const project = useProject(projectId);
  const searches = useQuery({
    queryKey: searchesKey(markId),
    queryFn: () => callApi<{ searches: SearchView[] }>(`/api/marks/${markId}/searches`),
  });
  const [issues, setIssues] = useState<Record<string, string>>({});
  const start = useMutation({
    mutationFn: (space: SpaceChoice) => callApi<{ search: SearchView }>(`/api/marks/${markId}/searches`, { method: "POST", body: { space: toRequestSpace(space) } }),
    onMutate: () => setIssues({}),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: searchesKey(markId) }),
    onError: (error) => setIssues(issuesByPath(error)),
  });

  if (markQuery.isPending || project.isPending) return <p className="text-ink-500">Loading the mark…</p>;
  if (markQuery.isError) return <p role="alert">The mark could not be loaded: {markQuery.error.message}</p>;
  if (project.isError) return <p role="alert">The project could not be loaded: {project.error.message}</p>;
  const { mark, loads, role } = markQuery.data;
  const { priceBook, project: proj } = project.data;
  const units = proj.units;
  const canRun = roleCan(role, "runSearch");
  const pricedFc = Object.keys(priceBook?.prices.concrete ?? {}).map(Number).filter(Number.isFinite).sort((a, b) => a - b);
  const base = `/w/${workspaceId}/projects/${projectId}/marks/${markId}`;
  const list = searches.data?.searches ?? [];
  const limitNote = (mark.limits as { note?: string }).note;

  return (
    <div className="space-y-8">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <p className="no-print text-sm">
            <Link href={base} className="text-oxide-700 underline">
              ← Mark {mark.label}
            </Link>
          </p>
          <h2 className="text-xl font-semibold">Alternatives for mark {mark.label}</h2>
          <p className="text-sm text-ink-700">
            Current design: {describeSection(mark.design.section, units)}
            {mark.design.braceLevels > 0 ? ` · ${mark.design.braceLevels} brace level${mark.design.braceLevels > 1 ? "s" : ""}` : ""} ·{" "}
            <Link href={`${base}/check`} className="text-oxide-700 underline">
              see its check
            </Link>{" "}
            ·{" "}
            <a href={`/api/marks/${markId}/package`} className="text-oxide-700 underline" download>
              download its calculation package (PDF)
            </a>
          </p>
        </div>
      </div>

      {!canRun ? (
        <p className="panel text-sm text-ink-700">Your role ({role}) reads searches and their results; engineers and estimators start them.</p>
      ) : !priceBook ? (
        <p className="panel text-sm">
          The project has no price book yet, so candidates cannot be priced.{" "}
          <Link href={`/w/${workspaceId}/projects/${projectId}/price-book`} className="text-oxide-700 underline">
            Add the price book
          </Link>{" "}
          first.
        </p>
      ) : loads.length === 0 ? (
        <p className="panel text-sm">
          Mark {mark.label} has no load combinations yet: add them on the{" "}
          <Link href={base} className="text-oxide-700 underline">
            mark&apos;s page
          </Link>{" "}
          and search then.
        </p>
      ) : (
        <SpaceForm
          initial={defaultSpace(mark.limits, mark.member, pricedFc)}
          units={units}
          pricedFc={pricedFc}
          braced={mark.member.braced}
          limitNote={limitNote}
          issues={issues}
          busy={start.isPending}
          onSubmit={(space) => start.mutate(space)}
        />
      )}
      {start.isError && Object.keys(issues).length === 0 ? (
        <p role="alert" className="text-sm text-strained-600">
          The search could not start: {start.error.message}
        </p>
      ) : null}

      <section aria-labelledby="searches-heading" className="space-y-3">
        <h2 id="searches-heading" className="text-lg font-semibold">
          Searches of this mark
        </h2>
        {searches.isError ? <p role="alert">The searches could not be loaded: {searches.error.message}</p> : null}
        {searches.isSuccess && list.length === 0 ? <p className="text-sm text-ink-700">No searches yet. {canRun ? "Choose a space above and start one." : ""}</p> : null}
        <ol className="space-y-3">
          {list.map((s) => (
            <SearchItem key={s.id} search={s} href={`${base}/searches/${s.id}`} canCancel={canRun} onSettled={() => void queryClient.invalidateQueries({ queryKey: searchesKey(markId) })} />
          ))}
        </ol>
      </section>

      <AlternativesPanel workspaceId={workspaceId} projectId={projectId} markId={markId} role={role} units={units} />
    </div>
  );
}

function SearchItem({ search, href, canCancel, onSettled }: { search: SearchView; href: string; canCancel: boolean; onSettled: () => void }) {
  const live = useLiveSearch(search).data;
  return (
    <li className="panel space-y-2" data-testid="search-item">
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
        <span className="font-medium">Started {formatWhen(live.createdAt)}</span>
        {live.stale ? (
          <span className="rounded bg-stone-100 px-2 py-0.5 text-xs font-semibold text-strained-600" title="the mark's loads, lengths or price book changed since this search ran">
            stale
          </span>
        ) : null}
        {live.stats?.candidates !== undefined ? (
          <span className="text-ink-500 tabular-nums">
            {formatNumber(live.stats.candidates, 0)} candidates in the space · {formatNumber(live.stats.passing ?? 0, 0)} passing · {formatNumber((live.stats.ms ?? 0) / 1000, 1)} s
          </span>
        ) : null}
        {live.status === "done" ? (
          <Link href={href} className="btn-quiet ml-auto">
            Open results
          </Link>
        ) : null}
      </div>
      <SearchProgress search={live} canCancel={canCancel} onSettled={onSettled} />
    </li>
  );
}
