// Applies the drizzle-kit migrations in drizzle/ to DATABASE_URL. Idempotent: applied migrations
// are recorded by Drizzle and skipped.
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { getDb, closeDb } from "../db/client";

async function main(): Promise<void> {
  await migrate(getDb(), { migrationsFolder: "drizzle" });
  await closeDb();
  console.log("[caryatid] migrations applied");
}

main().catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
