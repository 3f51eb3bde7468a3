import { findSearch, type SearchRow } from "@/db/queries/searches";
import { notFound } from "./api/errors";
import { authorizeMark } from "./authz";
import type { Permission } from "./permissions";
import type { SessionUser } from "./auth/session-user";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A search is reachable exactly when its mark is: same 404 for unknown and foreign searches. */
export async function authorizeSearch(user: SessionUser | null, searchId: string, permission: Permission) {
  const search: SearchRow | null = UUID.test(searchId) ? await findSearch(searchId) : null;
  if (!search) {
    if (!user) await authorizeMark(user, "", permission); // 401 before 404 for anonymous callers
    throw notFound("search not found");
  }
  try {
    const access = await authorizeMark(user, search.markId, permission);
    return { ...access, search };
  } catch (error) {
    if (error instanceof Error && "status" in error && (error as { status: number }).status === 404) throw notFound("search not found");
    throw error;
  }
}
