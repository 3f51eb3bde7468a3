import { NextResponse } from "next/server";
import { handler } from "@/lib/api/handler";
import { requireUser } from "@/lib/authz";
import { passwordChangeSchema } from "@/lib/validation/auth";
import { changePassword } from "@/db/queries/users";
import { setSessionCookie } from "@/lib/auth/session-cookie";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/**
 * Changes the password. Every session issued before the change stops working; this one is
 * re-issued so the person stays signed in.
 */
export const POST = handler({ body: passwordChangeSchema }, async ({ user, body }) => {
  const me = requireUser(user);
  const passwordHash = await changePassword(me, body.currentPassword, body.newPassword);
  const response = NextResponse.json({ ok: true, otherSessionsEnded: true });
  await setSessionCookie(response, me, passwordHash);
  return response;
});
