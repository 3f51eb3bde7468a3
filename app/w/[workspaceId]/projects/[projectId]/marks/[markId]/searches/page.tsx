import type { Metadata } from "next";
import { SearchesPage } from "@/components/search/searches-page";

export const metadata: Metadata = { title: "Alternatives search" };

export default async function MarkSearchesPage({ params }: { params: Promise<{ workspaceId: string; projectId: string; markId: string }> }) {
  const { workspaceId, projectId, markId } = await params;
  return <SearchesPage workspaceId={workspaceId} projectId={projectId} markId={markId} />;
}
