import { handler } from "@/lib/api/handler";
import { authorizeWorkspace } from "@/lib/authz";
import { listAuditEntries } from "@/db/queries/workspaces";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** The newest changes of the workspace (who, what, when, before and after), for its owners. */
export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeWorkspace(user, params.workspaceId ?? "", "manageMembers");
  return { entries: await listAuditEntries(access.workspaceId) };
});
