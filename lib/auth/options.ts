/**
 * next-auth configuration: two ways in, both as Credentials providers over our own tables so the
 * session stays a signed JWT in an http-only, SameSite=Lax cookie (Secure and __Secure- prefixed
 * whenever the app is served over https):
 *  - "password": e-mail + password (bcrypt), rate limited per address;
 *  - "email-link": a one-time token sent by e-mail (only its hash is stored; it works once).
 */
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { findUserById } from "@/db/queries/users";
import { authorizeEmailLink, authorizePassword, clientAddressOf } from "./credentials";
import { passwordFingerprint } from "./session-version";

/** Sessions end after 12 h without use (the cookie is re-issued while the app is in use). */
export const SESSION_MAX_AGE_SECONDS = 12 * 60 * 60;

const LOCAL_SECRET = "caryatid-local-development-secret-change-me";

export function authSecret(): string {
  return process.env.NEXTAUTH_SECRET ?? LOCAL_SECRET;
}

export const authOptions: NextAuthOptions = {
  secret: authSecret(),
  session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_SECONDS },
  useSecureCookies: (process.env.NEXTAUTH_URL ?? "").startsWith("https://"),
  pages: { signIn: "/sign-in", error: "/sign-in" },
  providers: [
    CredentialsProvider({
      id: "password",
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      authorize: (raw, req) => authorizePassword(raw, clientAddressOf(req?.headers)),
    }),
    CredentialsProvider({
      id: "email-link",
      name: "One-time link",
      credentials: { email: { label: "E-mail", type: "email" }, token: { label: "Token", type: "text" } },
      authorize: (raw) => authorizeEmailLink(raw),
    }),
  ],
  callbacks: {
    async jwt({ token, user, trigger }) {
      if (user) {
        token.sub = user.id;
        token.email = user.email;
        token.name = user.name;
        token.pwv = passwordFingerprint((await findUserById(user.id))?.passwordHash);
      }
      // The account page renames the user and asks for a fresh session; read the name back from
      // the database rather than trusting what the client sent. (The password fingerprint is never
      // refreshed here, or an old session could revive itself after a password change.)
      if (trigger === "update" && token.sub) {
        const fresh = await findUserById(token.sub);
        if (fresh) token.name = fresh.name;
      }
      return token;
    },
    async session({ session, token }) {
      if (!(await sessionStillValid(token))) return { expires: session.expires };
      if (session.user && token.sub) {
        (session.user as { id?: string }).id = token.sub;
        session.user.name = typeof token.name === "string" ? token.name : session.user.name;
      }
      return session;
    },
  },
};

/** A token is valid only while its user exists and has not changed the password since it was issued. */
export async function sessionStillValid(token: { sub?: string; pwv?: unknown } | null): Promise<boolean> {
  if (!token?.sub || typeof token.pwv !== "string" || !/^[0-9a-f-]{36}$/i.test(token.sub)) return false;
  const user = await findUserById(token.sub);
  return user !== null && passwordFingerprint(user.passwordHash) === token.pwv;
}
