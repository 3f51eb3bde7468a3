import type { Metadata } from "next";
import { MarkPage } from "@/components/marks/mark-page";

export const metadata: Metadata = { title: "Column mark" };

export default async function ColumnMarkPage({ params }: { params: Promise<{ workspaceId: string; projectId: string; markId: string }> }) {
  const { workspaceId, projectId, markId } = await params;
  return <MarkPage workspaceId={workspaceId} projectId={projectId} markId={markId} />;
}
