"use client";
/** A project's main screen: its column marks with verdicts, and the project-wide upload of load combinations. */
import { useQueryClient } from "@tanstack/react-query";
import { MarkList } from "@/components/marks/mark-list";
import { CsvImport } from "@/components/loads/csv-import";
import { QueryBoundary } from "./query-boundary";
import { useProject } from "./use-project";

export interface ProjectOverviewProps {
  workspaceId: string;
  projectId: string;
}

export function ProjectOverview(props: ProjectOverviewProps) {
  return (
    <QueryBoundary>
      <OverviewInner {...props} />
    </QueryBoundary>
  );
}

function OverviewInner({ workspaceId, projectId }: ProjectOverviewProps) {
  const queryClient = useQueryClient();
  const project = useProject(projectId);
  return (
    <div className="space-y-8">
      <MarkList workspaceId={workspaceId} projectId={projectId} />
      {project.data ? (
        <CsvImport
          kind="marks"
          endpoint={`/api/projects/${projectId}/marks/import`}
          units={project.data.project.units}
          withMark
          canImport={project.data.can.editMarks}
          onImported={() => void queryClient.invalidateQueries({ queryKey: ["marks", projectId] })}
        />
      ) : null}
      {project.data ? (
        <CsvImport
          endpoint={`/api/projects/${projectId}/loads/import`}
          units={project.data.project.units}
          withMark
          canImport={project.data.can.editLoads}
          onImported={() => void queryClient.invalidateQueries({ queryKey: ["marks", projectId] })}
        />
      ) : null}
    </div>
  );
}
