import { and, count, eq, gt, lt } from "drizzle-orm";
import { getDb } from "../client";
import { signInAttempts } from "../schema";

/** Failed sign-ins allowed per address inside the window before further tries are refused. */
export const MAX_FAILED_ATTEMPTS = 5;
export const ATTEMPT_WINDOW_MS = 15 * 60 * 1000;
/** Failed sign-ins one client address may make across all e-mail addresses inside the window. */
export const MAX_FAILED_ATTEMPTS_PER_CLIENT = 30;

export async function recordSignInAttempt(key: string, ok: boolean, now = new Date()): Promise<void> {
  const db = getDb();
  await db.insert(signInAttempts).values({ key, ok, at: now });
  // Rows older than the window decide nothing any more; dropping this key's keeps the table small.
  await db.delete(signInAttempts).where(and(eq(signInAttempts.key, key), lt(signInAttempts.at, new Date(now.getTime() - ATTEMPT_WINDOW_MS))));
}

export async function tooManyFailedAttempts(key: string, limit = MAX_FAILED_ATTEMPTS, now = new Date()): Promise<boolean> {
  const since = new Date(now.getTime() - ATTEMPT_WINDOW_MS);
  const [row] = await getDb()
    .select({ n: count() })
    .from(signInAttempts)
    .where(and(eq(signInAttempts.key, key), eq(signInAttempts.ok, false), gt(signInAttempts.at, since)));
  return (row?.n ?? 0) >= limit;
}

/** One-time links one address may request inside the window (each request is recorded). */
export const MAX_LINK_REQUESTS = 5;

/** Counts every attempt (successful or not) under this key inside the window. */
export async function countRecentAttempts(key: string, now = new Date()): Promise<number> {
  const since = new Date(now.getTime() - ATTEMPT_WINDOW_MS);
  const [row] = await getDb()
    .select({ n: count() })
    .from(signInAttempts)
    .where(and(eq(signInAttempts.key, key), gt(signInAttempts.at, since)));
  return row?.n ?? 0;
}
