import type { Metadata } from "next";
import { NewMark } from "@/components/marks/new-mark";

export const metadata: Metadata = { title: "New column mark" };

export default async function NewMarkPage({ params }: { params: Promise<{ workspaceId: string; projectId: string }> }) {
  const { workspaceId, projectId } = await params;
  return (
    <>
      <h2 className="mb-4 text-xl font-semibold">New column mark</h2>
      <NewMark workspaceId={workspaceId} projectId={projectId} />
    </>
  );
}
