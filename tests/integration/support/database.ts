/**
 * Integration tests run against the real test database that scripts/test.sh starts
 * (DATABASE_URL). Run alone, they need `npm test`'s cluster or any DATABASE_URL.
 */
import { getDb, closeDb, getPool } from "@/db/client";

export function testDb() {
  if (!process.env.DATABASE_URL) throw new Error("DATABASE_URL is not set: run through `npm test`");
  return getDb();
}

export { closeDb, getPool };

/** A unique suffix so parallel test files never collide on unique columns. */
export function uniqueSuffix(): string {
  return `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 8)}`;
}
