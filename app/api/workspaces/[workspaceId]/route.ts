import { handler } from "@/lib/api/handler";
import { authorizeWorkspace } from "@/lib/authz";
import { notFound } from "@/lib/api/errors";
import { getWorkspace } from "@/db/queries/workspaces";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeWorkspace(user, params.workspaceId ?? "", "read");
  const workspace = await getWorkspace(access.workspaceId);
  if (!workspace) throw notFound("workspace not found");
  return { workspace: { ...workspace, createdAt: workspace.createdAt.toISOString() }, role: access.role };
});
