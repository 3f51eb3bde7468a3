import type { Metadata } from "next";
import { ScheduleView } from "@/components/schedule/schedule-view";

export const metadata: Metadata = { title: "Column schedule" };

export default async function SchedulePage({ params }: { params: Promise<{ workspaceId: string; projectId: string }> }) {
  const { workspaceId, projectId } = await params;
  return <ScheduleView workspaceId={workspaceId} projectId={projectId} />;
}
