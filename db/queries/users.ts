import { eq } from "drizzle-orm";
import { getDb } from "../client";
import { users } from "../schema";
import { recordAudit } from "@/lib/audit";
import { HttpError, notFound, unprocessable } from "@/lib/api/errors";
import { hashPassword, verifyPassword } from "@/lib/auth/password";
import type { SessionUser } from "@/lib/auth/session-user";

export async function findUserByEmail(email: string) {
  const [user] = await getDb().select().from(users).where(eq(users.email, email.toLowerCase()));
  return user ?? null;
}

export async function findUserById(id: string) {
  const [user] = await getDb().select().from(users).where(eq(users.id, id));
  return user ?? null;
}

/** What other people may see of a user: never the password hash. */
export function publicUser(user: { id: string; email: string; name: string }) {
  return { id: user.id, email: user.email, name: user.name };
}

export function isUniqueViolation(error: unknown): boolean {
  // drizzle wraps the driver error; PostgreSQL's unique_violation is SQLSTATE 23505
  const e = error as { code?: string; cause?: { code?: string } } | null;
  return e?.code === "23505" || e?.cause?.code === "23505";
}

export const EMAIL_TAKEN = "an account with this e-mail address already exists; sign in instead";

/** Creates an account with a bcrypt hash of the password; a taken address is a 409 on the email field. */
export async function createUser(input: { email: string; name: string; password: string; emailVerified?: Date | null }) {
  const passwordHash = await hashPassword(input.password);
  try {
    return await getDb().transaction(async (tx) => {
      const [user] = await tx
        .insert(users)
        .values({ email: input.email.toLowerCase(), name: input.name, passwordHash, emailVerified: input.emailVerified ?? null })
        .returning();
      if (!user) throw new Error("user insert returned nothing");
      await recordAudit({ workspaceId: null, userId: user.id, action: "create", entity: "user", entityId: user.id, after: publicUser(user) }, tx);
      return user;
    });
  } catch (error) {
    if (isUniqueViolation(error)) throw new HttpError(409, EMAIL_TAKEN, [{ path: "email", message: EMAIL_TAKEN }]);
    throw error;
  }
}

export async function renameUser(actor: SessionUser, name: string) {
  return getDb().transaction(async (tx) => {
    const [before] = await tx.select().from(users).where(eq(users.id, actor.id)).for("update");
    if (!before) throw notFound("account not found");
    const [after] = await tx
      .update(users)
      .set({ name, updatedAt: new Date(), version: before.version + 1 })
      .where(eq(users.id, actor.id))
      .returning();
    if (!after) throw notFound("account not found");
    await recordAudit(
      { workspaceId: null, userId: actor.id, action: "update", entity: "user", entityId: actor.id, before: publicUser(before), after: publicUser(after) },
      tx,
    );
    return publicUser(after);
  });
}

/**
 * Changes the password after checking the current one; the audit row records the change, never a
 * hash. Returns the new hash so the caller can re-issue the current session.
 */
export async function changePassword(actor: SessionUser, currentPassword: string, newPassword: string): Promise<string> {
  const user = await findUserById(actor.id);
  if (!user) throw notFound("account not found");
  if (user.passwordHash && !(await verifyPassword(currentPassword, user.passwordHash))) {
    throw unprocessable("the current password is not right", [{ path: "currentPassword", message: "this is not your current password" }]);
  }
  if (user.passwordHash && (await verifyPassword(newPassword, user.passwordHash))) {
    throw unprocessable("the new password is the one you already use", [{ path: "newPassword", message: "the new password must differ from the current one" }]);
  }
  const passwordHash = await hashPassword(newPassword);
  const changedAt = new Date();
  await getDb().transaction(async (tx) => {
    await tx.update(users).set({ passwordHash, updatedAt: changedAt, version: user.version + 1 }).where(eq(users.id, user.id));
    await recordAudit(
      {
        workspaceId: null,
        userId: actor.id,
        action: "change-password",
        entity: "user",
        entityId: actor.id,
        before: { passwordSet: Boolean(user.passwordHash), passwordChangedAt: user.updatedAt.toISOString() },
        after: { passwordSet: true, passwordChangedAt: changedAt.toISOString() },
      },
      tx,
    );
  });
  return passwordHash;
}
