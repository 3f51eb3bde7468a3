import type { Metadata } from "next";
import { MarkAlternatives } from "@/components/alternatives/mark-alternatives";

export const metadata: Metadata = { title: "Proposals and adopted alternatives" };

export default async function MarkAlternativesPage({ params }: { params: Promise<{ workspaceId: string; projectId: string; markId: string }> }) {
  const { workspaceId, projectId, markId } = await params;
  return <MarkAlternatives workspaceId={workspaceId} projectId={projectId} markId={markId} />;
}
