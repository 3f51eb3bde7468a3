import { and, eq, gt, isNull } from "drizzle-orm";
import { getDb } from "../client";
import { users, verificationTokens } from "../schema";
import { createToken, hashToken } from "@/lib/auth/tokens";

export const SIGN_IN_LINK_TTL_MS = 15 * 60 * 1000;

/** Stores the hash of a fresh one-time token for this address and returns the token itself. */
export async function issueSignInToken(email: string, now = new Date()): Promise<string> {
  const { token, hash } = createToken();
  await getDb()
    .insert(verificationTokens)
    .values({ identifier: email.toLowerCase(), token: hash, expires: new Date(now.getTime() + SIGN_IN_LINK_TTL_MS) });
  return token;
}

/** Marks the token used (once only, atomically) and returns its user, or null when invalid. */
export async function consumeSignInToken(email: string, token: string, now = new Date()) {
  const db = getDb();
  const used = await db
    .update(verificationTokens)
    .set({ usedAt: now })
    .where(
      and(
        eq(verificationTokens.identifier, email.toLowerCase()),
        eq(verificationTokens.token, hashToken(token)),
        isNull(verificationTokens.usedAt),
        gt(verificationTokens.expires, now),
      ),
    )
    .returning();
  if (used.length === 0) return null;
  const [user] = await db.select().from(users).where(eq(users.email, email.toLowerCase()));
  if (!user) return null;
  if (!user.emailVerified) await db.update(users).set({ emailVerified: now }).where(eq(users.id, user.id));
  return user;
}
