import type { Metadata } from "next";
import { ProjectOverview } from "@/components/projects/project-overview";

export const metadata: Metadata = { title: "Column marks" };

export default async function ProjectPage({ params }: { params: Promise<{ workspaceId: string; projectId: string }> }) {
  const { workspaceId, projectId } = await params;
  return <ProjectOverview workspaceId={workspaceId} projectId={projectId} />;
}
