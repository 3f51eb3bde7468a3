import { eq } from "drizzle-orm";
import { getDb } from "../client";
import { users } from "../schema";

export async function findUserByEmail(email: string) {
  const [user] = await getDb().select().from(users).where(eq(users.email, email.toLowerCase()));
  return user ?? null;
}

export async function findUserById(id: string) {
  const [user] = await getDb().select().from(users).where(eq(users.id, id));
  return user ?? null;
}
