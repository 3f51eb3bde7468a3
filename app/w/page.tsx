import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { AppShell } from "@/components/app-shell/app-shell";
import { CreateWorkspaceForm } from "@/components/members/create-workspace-form";
import { requirePageUser } from "@/lib/auth/page-access";
import { listWorkspacesOf } from "@/db/queries/workspaces";

export const metadata: Metadata = { title: "Workspaces" };
export const dynamic = "force-dynamic";

interface WorkspacesPageProps {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}

/** Straight into the person's first workspace; with none (or when asked), the way to start one. */
export default async function WorkspacesPage({ searchParams }: WorkspacesPageProps) {
  const user = await requirePageUser("/w");
  const workspaces = await listWorkspacesOf(user.id);
  const wantsNew = (await searchParams).new !== undefined;
  const first = workspaces[0];
  if (first && !wantsNew) redirect(`/w/${first.id}`);
  return (
    <AppShell user={user} workspaces={workspaces}>
      <div className="mx-auto max-w-xl space-y-6">
        <div>
          <h1 className="text-2xl font-semibold tracking-tight">{workspaces.length ? "Start another workspace" : "You are not in a workspace yet"}</h1>
          <p className="mt-2 text-sm text-ink-500">
            A workspace holds your firm&apos;s projects and the people who work on them. Start one and invite your colleagues — or, if your
            firm already uses Caryatid, ask its owner to invite {user.email}.
          </p>
        </div>
        <div className="panel">
          <CreateWorkspaceForm />
        </div>
      </div>
    </AppShell>
  );
}
