// Seeds the demo workspace idempotently: running it again changes nothing that already exists.
import bcrypt from "bcryptjs";
import { and, eq } from "drizzle-orm";
import { getDb, closeDb } from "../db/client";
import { users, workspaces, memberships } from "../db/schema";
import { DEMO_ACCOUNTS, DEMO_WORKSPACE } from "../lib/demo-accounts";
import { seedDemoBuilding } from "./seed-demo-building";

async function main(): Promise<void> {
  const db = getDb();
  await db.insert(workspaces).values(DEMO_WORKSPACE).onConflictDoNothing({ target: workspaces.slug });
  const [workspace] = await db.select().from(workspaces).where(eq(workspaces.slug, DEMO_WORKSPACE.slug));
  if (!workspace) throw new Error("demo workspace missing after insert");

  for (const account of DEMO_ACCOUNTS) {
    const passwordHash = await bcrypt.hash(account.password, 10);
    await db
      .insert(users)
      .values({ email: account.email, name: account.name, passwordHash, emailVerified: new Date() })
      .onConflictDoNothing({ target: users.email });
    const [user] = await db.select().from(users).where(eq(users.email, account.email));
    if (!user) throw new Error(`demo user ${account.email} missing after insert`);
    const existing = await db
      .select()
      .from(memberships)
      .where(and(eq(memberships.workspaceId, workspace.id), eq(memberships.userId, user.id)));
    if (existing.length === 0) {
      await db.insert(memberships).values({ workspaceId: workspace.id, userId: user.id, role: account.role });
    }
  }
  const [owner] = await db.select().from(users).where(eq(users.email, DEMO_ACCOUNTS[0].email));
  await seedDemoBuilding(db, workspace.id, owner?.id ?? null);
  await closeDb();
  console.log("[caryatid] demo data ready");
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
