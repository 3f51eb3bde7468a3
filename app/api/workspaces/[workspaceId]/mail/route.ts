import { handler } from "@/lib/api/handler";
import { authorizeWorkspace } from "@/lib/authz";
import { notFound } from "@/lib/api/errors";
import { capturedMailVisible, listWorkspaceMail } from "@/lib/mail";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** The owner reads this workspace's outgoing mail while mail goes to the local catcher. */
export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeWorkspace(user, params.workspaceId ?? "", "readCapturedMail");
  if (!capturedMailVisible()) throw notFound("captured mail is shown only in development");
  return { messages: await listWorkspaceMail(access.workspaceId) };
});
