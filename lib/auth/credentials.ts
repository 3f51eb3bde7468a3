/**
 * The two ways in, as plain functions so they can be exercised against the real database without
 * the next-auth HTTP layer. lib/auth/options.ts hands them to next-auth's Credentials providers.
 */
import { z } from "zod";
import { findUserByEmail } from "@/db/queries/users";
import { consumeSignInToken } from "@/db/queries/sign-in-tokens";
import { MAX_FAILED_ATTEMPTS_PER_CLIENT, recordSignInAttempt, tooManyFailedAttempts } from "@/db/queries/sign-in-attempts";
import { verifyPassword } from "./password";
import type { SessionUser } from "./session-user";

/** Thrown (as its message) to next-auth so the sign-in form can say why, without a stack. */
export const RATE_LIMITED = "RateLimited";

const passwordCredentials = z.object({ email: z.email().max(254), password: z.string().min(1).max(200) });
const linkCredentials = z.object({ email: z.email().max(254), token: z.string().min(10).max(200) });

/**
 * The client's address as Next.js passes it on (X-Forwarded-For, which `next start` fills from the
 * socket when no proxy set it). Behind a proxy that overwrites the header it is the real client;
 * without one a client can choose it, so it only ever adds a limit, never lifts one.
 */
export function clientAddressOf(headers: Record<string, unknown> | Headers | undefined): string | null {
  const raw = headers instanceof Headers ? headers.get("x-forwarded-for") : headers?.["x-forwarded-for"];
  const first = typeof raw === "string" ? raw.split(",")[0]?.trim() : undefined;
  return first ? first.slice(0, 64) : null;
}

/**
 * E-mail + password. Failed attempts are counted per address, and per client across addresses
 * (against trying one password on many accounts); past either limit every try is refused (even a
 * right password) until the window has passed, so guessing cannot be sped up.
 */
export async function authorizePassword(raw: unknown, client: string | null = null): Promise<SessionUser | null> {
  const parsed = passwordCredentials.safeParse(raw);
  if (!parsed.success) return null;
  const email = parsed.data.email.toLowerCase();
  const clientKey = client ? `client:${client}` : null;
  if (await tooManyFailedAttempts(email)) throw new Error(RATE_LIMITED);
  if (clientKey && (await tooManyFailedAttempts(clientKey, MAX_FAILED_ATTEMPTS_PER_CLIENT))) throw new Error(RATE_LIMITED);
  const user = await findUserByEmail(email);
  const ok = (await verifyPassword(parsed.data.password, user?.passwordHash)) && user !== null;
  await recordSignInAttempt(email, ok);
  if (clientKey) await recordSignInAttempt(clientKey, ok);
  if (!user || !ok) return null;
  return { id: user.id, email: user.email, name: user.name };
}

/** A one-time link: the token is consumed atomically, so it works once and only before it expires. */
export async function authorizeEmailLink(raw: unknown): Promise<SessionUser | null> {
  const parsed = linkCredentials.safeParse(raw);
  if (!parsed.success) return null;
  const user = await consumeSignInToken(parsed.data.email.toLowerCase(), parsed.data.token);
  if (!user) return null;
  return { id: user.id, email: user.email, name: user.name };
}
