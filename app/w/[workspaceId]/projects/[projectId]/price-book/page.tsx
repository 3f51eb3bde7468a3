import type { Metadata } from "next";
import { PriceBookEditor } from "@/components/projects/price-book-editor";

export const metadata: Metadata = { title: "Price book" };

export default async function PriceBookPage({ params }: { params: Promise<{ projectId: string }> }) {
  const { projectId } = await params;
  return <PriceBookEditor projectId={projectId} />;
}
