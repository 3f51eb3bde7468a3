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
