import type { Metadata } from "next";
import { ProjectSettingsForm } from "@/components/projects/project-settings-form";

export const metadata: Metadata = { title: "Project settings" };

export default async function ProjectSettingsPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  return <ProjectSettingsForm projectId={projectId} />;
}
