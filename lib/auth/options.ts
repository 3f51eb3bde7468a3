/**
 * next-auth configuration: two ways in, both as Credentials providers over our own tables so the
 * session stays a signed JWT in an http-only cookie:
 *  - "password": e-mail + password (bcrypt), rate limited per address;
 *  - "email-link": a one-time token sent by e-mail (only its hash is stored; it works once).
 */
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { z } from "zod";
import { findUserByEmail } from "@/db/queries/users";
import { consumeSignInToken } from "@/db/queries/sign-in-tokens";
import { recordSignInAttempt, tooManyFailedAttempts } from "@/db/queries/sign-in-attempts";
import { verifyPassword } from "./password";

export const SESSION_MAX_AGE_SECONDS = 12 * 60 * 60;

const passwordCredentials = z.object({ email: z.email().max(254), password: z.string().min(1).max(200) });
const linkCredentials = z.object({ email: z.email().max(254), token: z.string().min(10).max(200) });

export const authOptions: NextAuthOptions = {
  secret: process.env.NEXTAUTH_SECRET ?? "caryatid-local-development-secret-change-me",
  session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_SECONDS },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      id: "password",
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(raw) {
        const parsed = passwordCredentials.safeParse(raw);
        if (!parsed.success) return null;
        const email = parsed.data.email.toLowerCase();
        if (await tooManyFailedAttempts(email)) throw new Error("RateLimited");
        const user = await findUserByEmail(email);
        const ok = await verifyPassword(parsed.data.password, user?.passwordHash);
        await recordSignInAttempt(email, ok);
        if (!user || !ok) return null;
        return { id: user.id, email: user.email, name: user.name };
      },
    }),
    CredentialsProvider({
      id: "email-link",
      name: "One-time link",
      credentials: { email: { label: "E-mail", type: "email" }, token: { label: "Token", type: "text" } },
      async authorize(raw) {
        const parsed = linkCredentials.safeParse(raw);
        if (!parsed.success) return null;
        const user = await consumeSignInToken(parsed.data.email.toLowerCase(), parsed.data.token);
        if (!user) return null;
        return { id: user.id, email: user.email, name: user.name };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.sub = user.id;
        token.email = user.email;
        token.name = user.name;
      }
      return token;
    },
    async session({ session, token }) {
      if (session.user && token.sub) {
        (session.user as { id?: string }).id = token.sub;
      }
      return session;
    },
  },
};
