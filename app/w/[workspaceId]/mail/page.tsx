import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { CapturedMail } from "@/components/members/captured-mail";
import { requireWorkspaceMember } from "@/lib/auth/page-access";
import { roleAllows } from "@/lib/permissions";
import { withArticle } from "@/components/members/role-text";
import { capturedMailVisible } from "@/lib/mail";

export const metadata: Metadata = { title: "Mail" };
export const dynamic = "force-dynamic";

interface MailPageProps {
  params: Promise<{ workspaceId: string }>;
}

/** Development only: the owner reads what the workspace sent, as the local mail catcher caught it. */
export default async function MailPage({ params }: MailPageProps) {
  const { workspaceId } = await params;
  const access = await requireWorkspaceMember(workspaceId, `/w/${workspaceId}/mail`);
  if (!capturedMailVisible()) notFound();
  if (!roleAllows(access.role, "readCapturedMail")) {
    return (
      <div className="panel max-w-xl text-sm text-ink-700">
        Only the workspace&apos;s owners read its outgoing mail. You are {withArticle(access.role)} here.
      </div>
    );
  }
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold tracking-tight">Mail</h1>
        <p className="mt-1 text-sm text-ink-500">
          In development, outgoing mail goes to a local catcher instead of anyone&apos;s inbox. Every message is kept in the outbox with
          its status, so nothing is lost while the catcher is down.
        </p>
      </div>
      <CapturedMail workspaceId={access.workspaceId} />
    </div>
  );
}
