import { handler } from "@/lib/api/handler";
import { requireUser } from "@/lib/authz";
import { passwordChangeSchema } from "@/lib/validation/auth";
import { changePassword } from "@/db/queries/users";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const POST = handler({ body: passwordChangeSchema }, async ({ user, body }) => {
  await changePassword(requireUser(user), body.currentPassword, body.newPassword);
  return { ok: true };
});
