import { getServerSession } from "next-auth";
import { authOptions } from "./options";
import type { SessionUser } from "./session-user";

/** The signed-in user of this request, or null. Only route handlers, pages and actions call this. */
export async function getSessionUser(): Promise<SessionUser | null> {
  const session = await getServerSession(authOptions);
  const user = session?.user as { id?: string; email?: string | null; name?: string | null } | undefined;
  if (!user?.id || !user.email) return null;
  return { id: user.id, email: user.email, name: user.name ?? "" };
}
