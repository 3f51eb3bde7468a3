import { findSearch } from "@/db/queries/searches";
import { authorizeMarkChild } from "./authz";
import type { Permission } from "./permissions";
import type { SessionUser } from "./auth/session-user";

export async function authorizeSearch(user: SessionUser | null, searchId: string, permission: Permission) {
  const { item, ...access } = await authorizeMarkChild(user, searchId, findSearch, permission, "search");
  return { ...access, search: item };
}
