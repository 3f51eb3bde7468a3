/**
 * People and workspaces for integration tests, written straight to the real test database through
 * the same query modules the app uses. Every address is unique, so files can run in parallel.
 */
import { createUser } from "@/db/queries/users";
import { createWorkspace } from "@/db/queries/workspaces";
import { getDb } from "@/db/client";
import { memberships } from "@/db/schema";
import { ROLES, type Role } from "@/lib/permissions";
import type { SessionUser } from "@/lib/auth/session-user";
import { uniqueSuffix } from "./database";

export interface TestUser extends SessionUser {
  password: string;
}

export const TEST_PASSWORD = "granite-lintel-4417";

export function uniqueEmail(label = "person"): string {
  return `${label}-${uniqueSuffix()}@firm.test`;
}

export async function createTestUser(label = "person", name = `Test ${label}`): Promise<TestUser> {
  const email = uniqueEmail(label);
  const user = await createUser({ email, name, password: TEST_PASSWORD, emailVerified: new Date() });
  return { id: user.id, email: user.email, name: user.name, password: TEST_PASSWORD };
}

export interface TestWorkspace {
  id: string;
  name: string;
  /** one member per role; `owner` created the workspace */
  members: Record<Role, TestUser>;
}

/** A workspace with one member per role (or the roles given), as an owner would build it. */
export async function createTestWorkspace(name = `Test firm ${uniqueSuffix()}`, roles: readonly Role[] = ROLES): Promise<TestWorkspace> {
  const owner = await createTestUser("owner");
  const workspace = await createWorkspace(owner, name);
  const members = { owner } as Record<Role, TestUser>;
  for (const role of roles) {
    if (role === "owner") continue;
    const user = await createTestUser(role);
    await getDb().insert(memberships).values({ workspaceId: workspace.id, userId: user.id, role });
    members[role] = user;
  }
  return { id: workspace.id, name: workspace.name, members };
}
