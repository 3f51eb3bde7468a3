import type { Metadata } from "next";
import { FormReusePanel } from "@/components/standardize/form-reuse-panel";

export const metadata: Metadata = { title: "Form reuse" };

export default async function FormReusePage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  return <FormReusePanel projectId={projectId} />;
}
