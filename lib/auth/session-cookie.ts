/**
 * Writing the session cookie ourselves, with next-auth's own encoder, name and attributes: used when
 * a password change must keep the person who changed it signed in while every other session ends.
 */
import { encode } from "next-auth/jwt";
import type { NextResponse } from "next/server";
import { authSecret, SESSION_MAX_AGE_SECONDS } from "./options";
import { passwordFingerprint } from "./session-version";
import type { SessionUser } from "./session-user";

export function usesSecureCookies(): boolean {
  return (process.env.NEXTAUTH_URL ?? "").startsWith("https://");
}

/** next-auth's rule: `__Secure-` prefixed (and Secure) whenever the app is served over https. */
export function sessionCookieName(): string {
  return usesSecureCookies() ? "__Secure-next-auth.session-token" : "next-auth.session-token";
}

/** The signed session token next-auth would issue for this user. */
export async function encodeSessionToken(user: SessionUser, passwordHash: string | null, maxAgeSeconds = SESSION_MAX_AGE_SECONDS, secret = authSecret()) {
  return encode({
    token: { sub: user.id, email: user.email, name: user.name, pwv: passwordFingerprint(passwordHash) },
    secret,
    maxAge: maxAgeSeconds,
  });
}

export async function setSessionCookie(response: NextResponse, user: SessionUser, passwordHash: string | null): Promise<void> {
  response.cookies.set(sessionCookieName(), await encodeSessionToken(user, passwordHash), {
    httpOnly: true,
    sameSite: "lax",
    path: "/",
    secure: usesSecureCookies(),
    maxAge: SESSION_MAX_AGE_SECONDS,
  });
}
