import { NextResponse } from "next/server";
import { handler } from "@/lib/api/handler";
import { requireUser } from "@/lib/authz";
import { workspaceCreateSchema } from "@/lib/validation/members";
import { createWorkspace, listWorkspacesOf } from "@/db/queries/workspaces";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** The workspaces the signed-in person belongs to, with their role in each. */
export const GET = handler({}, async ({ user }) => ({ workspaces: await listWorkspacesOf(requireUser(user).id) }));

/** Any signed-in person may start a workspace of their own and becomes its owner. */
export const POST = handler({ body: workspaceCreateSchema }, async ({ user, body }) => {
  const workspace = await createWorkspace(requireUser(user), body.name);
  return NextResponse.json({ workspace }, { status: 201 });
});
