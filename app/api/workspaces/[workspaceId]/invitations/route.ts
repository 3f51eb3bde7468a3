import { NextResponse } from "next/server";
import { handler } from "@/lib/api/handler";
import { authorizeWorkspace } from "@/lib/authz";
import { invitationCreateSchema } from "@/lib/validation/members";
import { createInvitation, INVITATION_TTL_MS, listOpenInvitations } from "@/db/queries/invitations";
import { getWorkspace } from "@/db/queries/workspaces";
import { sendMail } from "@/lib/mail";
import { appBaseUrl, invitationMail } from "@/lib/auth/mail-templates";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeWorkspace(user, params.workspaceId ?? "", "manageMembers");
  return { invitations: await listOpenInvitations(access.workspaceId) };
});

/**
 * Invites by e-mail. The invitation is stored before the mail is sent; when the mail server is down
 * the message waits in the outbox as "failed" and the answer says so.
 */
export const POST = handler({ body: invitationCreateSchema }, async ({ user, params, body }) => {
  const access = await authorizeWorkspace(user, params.workspaceId ?? "", "manageMembers");
  const { invitation, token } = await createInvitation(access.user, access.workspaceId, body.email, body.role);
  const workspace = await getWorkspace(access.workspaceId);
  const link = `${appBaseUrl()}/invitations/accept?token=${encodeURIComponent(token)}`;
  const mail = invitationMail({
    link,
    workspaceName: workspace?.name ?? "a workspace",
    inviterName: access.user.name,
    role: body.role,
    days: Math.round(INVITATION_TTL_MS / 86_400_000),
  });
  const sent = await sendMail({ to: body.email, workspaceId: access.workspaceId, ...mail });
  return NextResponse.json({ invitation, mail: { id: sent.id, status: sent.sent ? "sent" : "failed" } }, { status: 201 });
});
