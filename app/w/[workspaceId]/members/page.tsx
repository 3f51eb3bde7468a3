import type { Metadata } from "next";
import { MembersTable } from "@/components/members/members-table";
import { InvitationsPanel } from "@/components/members/invite-form";
import { RecentChanges } from "@/components/members/recent-changes";
import { requireWorkspaceMember } from "@/lib/auth/page-access";
import { roleAllows } from "@/lib/permissions";
import { withArticle } from "@/components/members/role-text";

export const metadata: Metadata = { title: "Members" };
export const dynamic = "force-dynamic";

interface MembersPageProps {
  params: Promise<{ workspaceId: string }>;
}

export default async function MembersPage({ params }: MembersPageProps) {
  const { workspaceId } = await params;
  const access = await requireWorkspaceMember(workspaceId, `/w/${workspaceId}/members`);
  const canManage = roleAllows(access.role, "manageMembers");
  return (
    <div className="space-y-6">
      <div>
        <h1 className="text-2xl font-semibold tracking-tight">Members</h1>
        <p className="mt-1 text-sm text-ink-500">
          {canManage
            ? "Owners change roles and remove members. Every workspace keeps at least one owner."
            : `You are ${withArticle(access.role)} here; only owners change roles or invite people.`}
        </p>
      </div>
      <MembersTable workspaceId={access.workspaceId} canManage={canManage} meId={access.user.id} />
      {canManage ? <InvitationsPanel workspaceId={access.workspaceId} /> : null}
      {canManage ? <RecentChanges workspaceId={access.workspaceId} /> : null}
    </div>
  );
}
