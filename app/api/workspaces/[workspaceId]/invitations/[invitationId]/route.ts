import { handler } from "@/lib/api/handler";
import { authorizeWorkspace } from "@/lib/authz";
import { notFound } from "@/lib/api/errors";
import { revokeInvitation } from "@/db/queries/invitations";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export const DELETE = handler({}, async ({ user, params }) => {
  const access = await authorizeWorkspace(user, params.workspaceId ?? "", "manageMembers");
  const invitationId = params.invitationId ?? "";
  if (!UUID.test(invitationId)) throw notFound("invitation not found");
  return revokeInvitation(access.user, access.workspaceId, invitationId);
});
