import { handler } from "@/lib/api/handler";
import { requireUser } from "@/lib/authz";
import { accountNameSchema } from "@/lib/validation/auth";
import { findUserById, publicUser, renameUser } from "@/db/queries/users";
import { listWorkspacesOf } from "@/db/queries/workspaces";
import { notFound } from "@/lib/api/errors";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** The signed-in person and the workspaces they belong to. */
export const GET = handler({}, async ({ user }) => {
  const me = requireUser(user);
  const row = await findUserById(me.id);
  if (!row) throw notFound("account not found");
  return { user: publicUser(row), hasPassword: Boolean(row.passwordHash), workspaces: await listWorkspacesOf(me.id) };
});

export const PATCH = handler({ body: accountNameSchema }, async ({ user, body }) => {
  const me = requireUser(user);
  return { user: await renameUser(me, body.name) };
});
