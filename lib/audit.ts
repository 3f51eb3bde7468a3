import { getDb, type Database } from "@/db/client";
import { auditLog } from "@/db/schema";

export interface AuditEntry {
  workspaceId: string | null;
  userId: string | null;
  action: string;
  entity: string;
  entityId?: string | null;
  before?: unknown;
  after?: unknown;
}

type Executor = Pick<Database, "insert">;

/** One row per change: who, what, when, before and after. Pass the transaction to keep it atomic. */
export async function recordAudit(entry: AuditEntry, executor: Executor = getDb()): Promise<void> {
  await executor.insert(auditLog).values({
    workspaceId: entry.workspaceId,
    userId: entry.userId,
    action: entry.action,
    entity: entry.entity,
    entityId: entry.entityId ?? null,
    before: entry.before ?? null,
    after: entry.after ?? null,
  });
}
