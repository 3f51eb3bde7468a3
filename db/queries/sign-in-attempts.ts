import { and, count, eq, gt } from "drizzle-orm";
import { getDb } from "../client";
import { signInAttempts } from "../schema";

/** Failed sign-ins allowed per address inside the window before further tries are refused. */
export const MAX_FAILED_ATTEMPTS = 5;
export const ATTEMPT_WINDOW_MS = 15 * 60 * 1000;

export async function recordSignInAttempt(key: string, ok: boolean): Promise<void> {
  await getDb().insert(signInAttempts).values({ key, ok });
}

export async function tooManyFailedAttempts(key: string, now = new Date()): Promise<boolean> {
  const since = new Date(now.getTime() - ATTEMPT_WINDOW_MS);
  const [row] = await getDb()
    .select({ n: count() })
    .from(signInAttempts)
    .where(and(eq(signInAttempts.key, key), eq(signInAttempts.ok, false), gt(signInAttempts.at, since)));
  return (row?.n ?? 0) >= MAX_FAILED_ATTEMPTS;
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
