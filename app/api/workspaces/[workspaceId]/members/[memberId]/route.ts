import { handler } from "@/lib/api/handler";
import { authorizeWorkspace } from "@/lib/authz";
import { forbidden, notFound } from "@/lib/api/errors";
import { roleAllows } from "@/lib/permissions";
import { roleChangeSchema } from "@/lib/validation/members";
import { changeMemberRole, membershipIdOf, removeMember } from "@/db/queries/members";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

function memberIdOf(params: Record<string, string>): string {
  const id = params.memberId ?? "";
  if (!UUID.test(id)) throw notFound("member not found");
  return id;
}

/** Owners change roles; the last owner cannot be demoted. */
export const PATCH = handler({ body: roleChangeSchema }, async ({ user, params, body }) => {
  const access = await authorizeWorkspace(user, params.workspaceId ?? "", "manageMembers");
  const member = await changeMemberRole(access.user, access.workspaceId, memberIdOf(params), body.role, body.version);
  return { member };
});

/** Owners remove members; anyone may leave a workspace themselves. The last owner stays. */
export const DELETE = handler({}, async ({ user, params }) => {
  const access = await authorizeWorkspace(user, params.workspaceId ?? "", "read");
  const memberId = memberIdOf(params);
  const own = await membershipIdOf(access.user.id, access.workspaceId);
  if (memberId !== own && !roleAllows(access.role, "manageMembers")) throw forbidden(`the ${access.role} role may not manage members`);
  return removeMember(access.user, access.workspaceId, memberId);
});
