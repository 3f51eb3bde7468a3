"use client";
/** A mark's screen: its data and current design, its load combinations (table and CSV upload), and the way to its check. */
import Link from "next/link";
import { useState } from "react";
import { useQuery, useQueryClient } from "@tanstack/react-query";
import { callApi } from "@/components/projects/api";
import { QueryBoundary } from "@/components/projects/query-boundary";
import type { ProjectRecord } from "@/components/projects/use-project";
import { LoadsTable } from "@/components/loads/loads-table";
import { CsvImport } from "@/components/loads/csv-import";
import { MarkForm } from "./mark-form";
import type { LoadRecord, MarkRecord } from "./mark-types";

export interface MarkPageProps {
  workspaceId: string;
  projectId: string;
  markId: string;
}

interface MarkResponse {
  mark: MarkRecord;
  loads: LoadRecord[];
  project: ProjectRecord;
  role: string;
  can: { editMarks: boolean; editLoads: boolean };
}

export function MarkPage(props: MarkPageProps) {
  return (
    <QueryBoundary>
      <MarkPageInner {...props} />
    </QueryBoundary>
  );
}

function MarkPageInner({ workspaceId, projectId, markId }: MarkPageProps) {
  const queryClient = useQueryClient();
  const query = useQuery({ queryKey: ["mark", markId], queryFn: () => callApi<MarkResponse>(`/api/marks/${markId}`) });
  const [savedVersion, setSavedVersion] = useState<number | null>(null);
  if (query.isPending) return <p className="text-ink-500">Loading the mark…</p>;
  if (query.isError) return <p role="alert">The mark could not be loaded: {query.error.message}</p>;
  const { mark, loads, project, can } = query.data;
  const refresh = () => {
    void queryClient.invalidateQueries({ queryKey: ["mark", markId] });
    void queryClient.invalidateQueries({ queryKey: ["check-input", markId] });
    void queryClient.invalidateQueries({ queryKey: ["marks", projectId] });
  };
  const checkHref = `/w/${workspaceId}/projects/${projectId}/marks/${markId}/check`;
  return (
    <div className="space-y-8">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 className="text-xl font-semibold">
          Mark {mark.label}
          {mark.level ? <span className="font-normal text-ink-500"> · {mark.level}</span> : null}
        </h2>
        <div className="flex gap-2">
          <Link href={`/w/${workspaceId}/projects/${projectId}/marks/${markId}/searches`} className="btn-quiet">
            Search alternatives
          </Link>
          <Link href={checkHref} className="btn-primary">
            Check this mark
          </Link>
        </div>
      </div>
      <MarkForm key={mark.version} projectId={projectId} workspaceId={workspaceId} units={project.units} defaults={{ cover: project.cover }} mark={mark}
        canEdit={can.editMarks}
        justSaved={savedVersion === mark.version}
        onSaved={(saved) => {
          setSavedVersion(saved.version);
          refresh();
        }}
      />
      <section aria-labelledby="loads-heading" className="space-y-4">
        <h2 id="loads-heading" className="text-lg font-semibold">
          Load combinations
        </h2>
        {loads.length === 0 ? <p className="text-sm text-ink-700">No load combinations yet: type them into the table, or upload the CSV from the frame analysis below.</p> : null}
        <div className="panel">
          <LoadsTable markId={markId} loads={loads} units={project.units} braced={mark.member.braced} canEdit={can.editLoads} onChanged={refresh} />
        </div>
        <CsvImport endpoint={`/api/marks/${markId}/loads/import`} units={project.units} withMark={false} canImport={can.editLoads} onImported={refresh} />
      </section>
    </div>
  );
}
