"use client";
/** A page of its own for a mark's proposals and adopted alternatives (linked from the schedule). */
import Link from "next/link";
import { useQuery } from "@tanstack/react-query";
import { callApi } from "@/components/projects/api";
import { QueryBoundary } from "@/components/projects/query-boundary";
import type { MarkResponse } from "@/components/search/search-types";
import { AlternativesPanel } from "./alternatives-panel";

export interface MarkAlternativesProps {
  workspaceId: string;
  projectId: string;
  markId: string;
}

export function MarkAlternatives(props: MarkAlternativesProps) {
  return (
    <QueryBoundary>
      <MarkAlternativesInner {...props} />
    </QueryBoundary>
  );
}

function MarkAlternativesInner({ workspaceId, projectId, markId }: MarkAlternativesProps) {
  const mark = useQuery({ queryKey: ["mark", markId], queryFn: () => callApi<MarkResponse>(`/api/marks/${markId}`) });
  if (mark.isPending) return <p className="text-ink-500">Loading the mark…</p>;
  if (mark.isError) return <p role="alert">The mark could not be loaded: {mark.error.message}</p>;
  const base = `/w/${workspaceId}/projects/${projectId}/marks/${markId}`;
  return (
    <div className="space-y-4">
      <p className="no-print text-sm">
        <Link href={base} className="text-oxide-700 underline">
          ← Mark {mark.data.mark.label}
        </Link>{" "}
        ·{" "}
        <Link href={`${base}/searches`} className="text-oxide-700 underline">
          Search alternatives
        </Link>
      </p>
      <AlternativesPanel workspaceId={workspaceId} projectId={projectId} markId={markId} role={mark.data.role} units={mark.data.project.units} />
    </div>
  );
}
