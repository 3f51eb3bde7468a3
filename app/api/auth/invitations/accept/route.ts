import { handler } from "@/lib/api/handler";
import { badRequest } from "@/lib/api/errors";
import { invitationAcceptSchema } from "@/lib/validation/members";
import { acceptInvitation, acceptInvitationAsNewcomer } from "@/db/queries/invitations";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/**
 * Accepts an invitation: signed in, with the token alone (the invitation must name the person's own
 * address); signed out, with a name and password that create the account for the invited address.
 */
export const POST = handler({ body: invitationAcceptSchema }, async ({ user, body }) => {
  if (user) return acceptInvitation(user, body.token);
  if (body.name === undefined || body.password === undefined) {
    throw badRequest("sign in, or choose a name and password to create your account", [
      { path: "name", message: "enter your name" },
      { path: "password", message: "choose a password" },
    ]);
  }
  return acceptInvitationAsNewcomer(body.token, body.name, body.password);
});
