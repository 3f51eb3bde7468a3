import { findAlternative } from "@/db/queries/alternatives";
import { authorizeMarkChild } from "./authz";
import type { Permission } from "./permissions";
import type { SessionUser } from "./auth/session-user";

export async function authorizeAlternative(user: SessionUser | null, id: string, permission: Permission) {
  const { item, ...access } = await authorizeMarkChild(user, id, findAlternative, permission, "alternative");
  return { ...access, alternative: item };
}
