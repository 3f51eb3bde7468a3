import type { ReactNode } from "react";
import { AppShell } from "@/components/app-shell/app-shell";
import { requireWorkspaceMember } from "@/lib/auth/page-access";
import { listWorkspacesOf } from "@/db/queries/workspaces";
import { roleAllows } from "@/lib/permissions";
import { capturedMailVisible } from "@/lib/mail";

export const dynamic = "force-dynamic";

interface WorkspaceLayoutProps {
  children: ReactNode;
  params: Promise<{ workspaceId: string }>;
}

/** Signed out → sign-in; not a member → 404; otherwise the app shell around the workspace's pages. */
export default async function WorkspaceLayout({ children, params }: WorkspaceLayoutProps) {
  const { workspaceId } = await params;
  const access = await requireWorkspaceMember(workspaceId);
  const workspaces = await listWorkspacesOf(access.user.id);
  const current = workspaces.find((w) => w.id === access.workspaceId) ?? { id: access.workspaceId, name: "Workspace", role: access.role };
  return (
    <AppShell
      user={access.user}
      workspaces={workspaces}
      current={current}
      showMail={roleAllows(access.role, "readCapturedMail") && capturedMailVisible()}
    >
      {children}
    </AppShell>
  );
}
