/**
 * The signed-in user of a request. Route handlers pass their NextRequest, so the signed next-auth
 * JWT is decoded straight from the request's cookie (no request-scope magic, and the same path in
 * tests and in the running app); pages and layouts call it without arguments and go through
 * getServerSession, which reads the cookie via next/headers.
 */
import { getServerSession } from "next-auth";
import { getToken, type JWT } from "next-auth/jwt";
import type { NextRequest } from "next/server";
import { authOptions, authSecret, sessionStillValid } from "./options";
import type { SessionUser } from "./session-user";

function userFromToken(token: JWT | null): SessionUser | null {
  if (!token?.sub || typeof token.email !== "string") return null;
  return { id: token.sub, email: token.email, name: typeof token.name === "string" ? token.name : "" };
}

export async function getSessionUser(req?: NextRequest): Promise<SessionUser | null> {
  if (req) {
    const token = await getToken({ req, secret: authSecret() });
    return token && (await sessionStillValid(token)) ? userFromToken(token) : null;
  }
  const session = await getServerSession(authOptions);
  const user = session?.user as { id?: string; email?: string | null; name?: string | null } | undefined;
  if (!user?.id || !user.email) return null;
  return { id: user.id, email: user.email, name: user.name ?? "" };
}
