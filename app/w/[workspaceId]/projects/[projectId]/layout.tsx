import type { ReactNode } from "react";
import { ProjectHeader } from "@/components/projects/project-header";
import { QueryBoundary } from "@/components/projects/query-boundary";

export default async function ProjectLayout({ children, params }: { children: ReactNode; params: Promise<{ workspaceId: string; projectId: string }> }) {
  const { workspaceId, projectId } = await params;
  return (
    <QueryBoundary>
      <div className="mx-auto max-w-6xl px-6 py-6 print:max-w-none print:px-0">
        <ProjectHeader workspaceId={workspaceId} projectId={projectId} />
        {children}
      </div>
    </QueryBoundary>
  );
}
