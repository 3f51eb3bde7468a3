import { handler } from "@/lib/api/handler";
import { authorizeWorkspace } from "@/lib/authz";
import { listMembers } from "@/db/queries/members";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** Every member may see who else is in the workspace (reviewers read everything). */
export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeWorkspace(user, params.workspaceId ?? "", "read");
  return { members: await listMembers(access.workspaceId), role: access.role, me: access.user.id };
});
