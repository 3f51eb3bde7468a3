import { findSearch, type SearchRow } from "@/db/queries/searches";
import { HttpError, notFound } from "./api/errors";
import { authorizeMark, requireUser } from "./authz";
import type { Permission } from "./permissions";
import type { SessionUser } from "./auth/session-user";

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A search is reachable exactly when its mark is: the same 404 for unknown and foreign searches. */
export async function authorizeSearch(user: SessionUser | null, searchId: string, permission: Permission) {
  requireUser(user);
  const search: SearchRow | null = UUID.test(searchId) ? await findSearch(searchId) : null;
  if (!search) throw notFound("search not found");
  try {
    const access = await authorizeMark(user, search.markId, permission);
    return { ...access, search };
  } catch (error) {
    if (error instanceof HttpError && error.status === 404) throw notFound("search not found");
    throw error;
  }
}
