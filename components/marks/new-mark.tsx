"use client";
/** The form for a new column mark, with the project's defaults. */
import { QueryBoundary } from "@/components/projects/query-boundary";
import { useProject } from "@/components/projects/use-project";
import { MarkForm } from "./mark-form";

export interface NewMarkProps {
  workspaceId: string;
  projectId: string;
}

export function NewMark(props: NewMarkProps) {
  return (
    <QueryBoundary>
      <NewMarkInner {...props} />
    </QueryBoundary>
  );
}

function NewMarkInner({ workspaceId, projectId }: NewMarkProps) {
  const project = useProject(projectId);
  if (project.isPending) return <p className="text-ink-500">Loading…</p>;
  if (project.isError) return <p role="alert">The project could not be loaded: {project.error.message}</p>;
  return (
    <MarkForm projectId={projectId} workspaceId={workspaceId} units={project.data.project.units} defaults={{ cover: project.data.project.cover }} canEdit={project.data.can.editMarks} />
  );
}
