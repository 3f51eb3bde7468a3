import type { Metadata } from "next";
import Link from "next/link";
import { CheckView } from "@/components/marks/check-view";

export const metadata: Metadata = { title: "Check" };

export default async function MarkCheckPage({ params }: { params: Promise<{ workspaceId: string; projectId: string; markId: string }> }) {
  const { workspaceId, projectId, markId } = await params;
  return (
    <>
      <p className="no-print mb-3 text-sm">
        <Link href={`/w/${workspaceId}/projects/${projectId}/marks/${markId}`} className="text-oxide-700 underline">
          ← back to the mark
        </Link>
      </p>
      <CheckView workspaceId={workspaceId} projectId={projectId} markId={markId} />
    </>
  );
}
