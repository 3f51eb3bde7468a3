import { handler } from "@/lib/api/handler";
import { tooManyRequests } from "@/lib/api/errors";
import { emailLinkRequestSchema, safeCallbackPath } from "@/lib/validation/auth";
import { findUserByEmail } from "@/db/queries/users";
import { issueSignInToken, SIGN_IN_LINK_TTL_MS } from "@/db/queries/sign-in-tokens";
import { countRecentAttempts, MAX_LINK_REQUESTS, recordSignInAttempt } from "@/db/queries/sign-in-attempts";
import { sendMail } from "@/lib/mail";
import { appBaseUrl, signInLinkMail } from "@/lib/auth/mail-templates";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

export const LINK_SENT_MESSAGE = "If an account uses this address, a sign-in link is on its way.";

/**
 * Sends a one-time sign-in link. The answer is the same whether or not the address has an account,
 * so the form cannot be used to find out who uses Caryatid.
 */
export const POST = handler({ body: emailLinkRequestSchema }, async ({ body }) => {
  const key = `link:${body.email}`;
  if ((await countRecentAttempts(key)) >= MAX_LINK_REQUESTS) {
    throw tooManyRequests("too many sign-in links were asked for this address; wait 15 minutes and try again");
  }
  await recordSignInAttempt(key, true);
  const user = await findUserByEmail(body.email);
  if (user) {
    const token = await issueSignInToken(user.email);
    const params = new URLSearchParams({ email: user.email, token, callbackUrl: safeCallbackPath(body.callbackUrl) });
    const link = `${appBaseUrl()}/sign-in/link?${params.toString()}`;
    await sendMail({ to: user.email, ...signInLinkMail(link, Math.round(SIGN_IN_LINK_TTL_MS / 60_000)) });
  }
  return { ok: true, message: LINK_SENT_MESSAGE };
});
