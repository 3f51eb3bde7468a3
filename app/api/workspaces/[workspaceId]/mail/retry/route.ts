import { handler } from "@/lib/api/handler";
import { authorizeWorkspace } from "@/lib/authz";
import { deliverPendingMail } from "@/lib/mail";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** Sends again every message of this workspace that is still waiting or failed. */
export const POST = handler({}, async ({ user, params }) => {
  const access = await authorizeWorkspace(user, params.workspaceId ?? "", "readCapturedMail");
  return { sent: await deliverPendingMail({ workspaceId: access.workspaceId }) };
});
