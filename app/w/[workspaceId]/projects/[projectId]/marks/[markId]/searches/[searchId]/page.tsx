import type { Metadata } from "next";
import { SearchResults } from "@/components/search/search-results";

export const metadata: Metadata = { title: "Search results" };

export default async function SearchResultsPage({ params }: { params: Promise<{ workspaceId: string; projectId: string; markId: string; searchId: string }> }) {
  const { workspaceId, projectId, markId, searchId } = await params;
  return <SearchResults workspaceId={workspaceId} projectId={projectId} markId={markId} searchId={searchId} />;
}
