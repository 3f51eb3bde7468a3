import { desc, eq } from "drizzle-orm";
import { handler } from "@/lib/api/handler";
import { authorizeWorkspace } from "@/lib/authz";
import { getDb } from "@/db/client";
import { auditLog, users } from "@/db/schema";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

/** The newest changes of the workspace (who, what, when, before and after), for its owners. */
export const GET = handler({}, async ({ user, params }) => {
  const access = await authorizeWorkspace(user, params.workspaceId ?? "", "manageMembers");
  const rows = await getDb()
    .select({
      id: auditLog.id,
      action: auditLog.action,
      entity: auditLog.entity,
      entityId: auditLog.entityId,
      before: auditLog.before,
      after: auditLog.after,
      at: auditLog.at,
      userName: users.name,
      userEmail: users.email,
    })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.userId))
    .where(eq(auditLog.workspaceId, access.workspaceId))
    .orderBy(desc(auditLog.at))
    .limit(200);
  return { entries: rows.map((r) => ({ ...r, at: r.at.toISOString() })) };
});
