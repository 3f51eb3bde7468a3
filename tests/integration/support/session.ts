/**
 * Calls route handlers the way Next.js does, as a given user: a real signed next-auth JWT (the
 * same `encode` next-auth uses) in the session cookie of a NextRequest. Nothing of ours is mocked;
 * lib/auth/session.ts decodes the cookie with next-auth's getToken exactly as in the running app.
 *
 *   const res = await callRoute(GET, "/api/workspaces/ID/members", { user, params: { workspaceId: "ID" } });
 *   expect(res.status).toBe(200);
 */
import { NextRequest } from "next/server";
import { encodeSessionToken, sessionCookieName } from "@/lib/auth/session-cookie";
import { SESSION_MAX_AGE_SECONDS } from "@/lib/auth/options";
import { findUserById } from "@/db/queries/users";
import type { SessionUser } from "@/lib/auth/session-user";

export { sessionCookieName };

/**
 * `name=value` of a session cookie for this user, signed with the app's secret. It carries the
 * fingerprint of the user's current password hash (read from the database), as a real sign-in does,
 * so it stops working once the password changes. `passwordHash` overrides that (e.g. a stale one).
 */
export async function sessionCookieFor(
  user: SessionUser,
  options: { maxAgeSeconds?: number; secret?: string; passwordHash?: string | null } = {},
): Promise<string> {
  const passwordHash = options.passwordHash !== undefined ? options.passwordHash : ((await findUserById(user.id))?.passwordHash ?? null);
  const value = await encodeSessionToken(user, passwordHash, options.maxAgeSeconds ?? SESSION_MAX_AGE_SECONDS, options.secret);
  return `${sessionCookieName()}=${value}`;
}

export function appOrigin(): string {
  return (process.env.NEXTAUTH_URL ?? "http://127.0.0.1:3100").replace(/\/+$/, "");
}

export interface RequestOptions {
  method?: string;
  /** serialised as JSON unless it is already a string */
  body?: unknown;
  /** signed-in user; omit for an anonymous request */
  user?: SessionUser | null;
  /** a ready cookie header instead of `user` (e.g. an expired or forged token) */
  cookie?: string;
  headers?: Record<string, string>;
}

export async function buildRequest(path: string, options: RequestOptions = {}): Promise<NextRequest> {
  const headers = new Headers(options.headers);
  const url = new URL(path, appOrigin());
  headers.set("host", url.host);
  const cookie = options.cookie ?? (options.user ? await sessionCookieFor(options.user) : undefined);
  if (cookie) headers.set("cookie", cookie);
  let body: string | undefined;
  if (options.body !== undefined) {
    body = typeof options.body === "string" ? options.body : JSON.stringify(options.body);
    if (!headers.has("content-type")) headers.set("content-type", "application/json");
  }
  return new NextRequest(url, { method: options.method ?? "GET", headers, body });
}

type RouteFn = (req: NextRequest, context: { params: Promise<Record<string, string>> }) => Promise<Response>;

export interface RouteResult<T = Record<string, unknown>> {
  status: number;
  json: T;
  response: Response;
}

/** Runs an exported route handler (GET, POST, ...) and returns its status and parsed JSON. */
export async function callRoute<T = Record<string, unknown>>(
  route: RouteFn,
  path: string,
  options: RequestOptions & { params?: Record<string, string> } = {},
): Promise<RouteResult<T>> {
  const req = await buildRequest(path, options);
  const response = await route(req, { params: Promise.resolve(options.params ?? {}) });
  const text = await response.text();
  let json: unknown = null;
  try {
    json = text ? JSON.parse(text) : null;
  } catch {
    json = { raw: text };
  }
  return { status: response.status, json: json as T, response };
}
