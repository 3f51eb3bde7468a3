/**
 * The one-time sign-in link, end to end through the real mail catcher: the route stores only the
 * token's hash, sends the link, and the link signs in once, before it expires.
 */
import { afterAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { closeDb, testDb } from "./support/database";
import { callRoute } from "./support/session";
import { createTestUser, uniqueEmail } from "./support/fixtures";
import { linkFrom, listCaughtMail, waitForMail } from "./support/mail-catcher";
import { mailOutbox, verificationTokens } from "@/db/schema";
import { POST as requestLink } from "@/app/api/auth/email-link/route";
import { authorizeEmailLink } from "@/lib/auth/credentials";
import { issueSignInToken, SIGN_IN_LINK_TTL_MS } from "@/db/queries/sign-in-tokens";
import { MAX_LINK_REQUESTS } from "@/db/queries/sign-in-attempts";

afterAll(closeDb);

describe("POST /api/auth/email-link", () => {
  it("mails a link that signs in once; the database holds only the token's hash", async () => {
    const user = await createTestUser("linker");
    const res = await callRoute<{ message: string }>(requestLink, "/api/auth/email-link", {
      method: "POST", body: { email: user.email, callbackUrl: "/w" },
    });
    expect(res.status).toBe(200);
    const mail = await waitForMail(user.email, { subject: "sign-in link" });
    const link = linkFrom(mail, "/sign-in/link");
    expect(link.origin).toBe(process.env.NEXTAUTH_URL);
    const token = link.searchParams.get("token") ?? "";
    expect(link.searchParams.get("email")).toBe(user.email);
    expect(token.length).toBeGreaterThanOrEqual(40);

    const stored = await testDb().select().from(verificationTokens).where(eq(verificationTokens.identifier, user.email));
    expect(stored).toHaveLength(1);
    expect(stored[0]?.token).not.toBe(token);
    expect(stored[0]?.token).toMatch(/^[0-9a-f]{64}$/);

    const [outbox] = await testDb().select().from(mailOutbox).where(eq(mailOutbox.to, user.email));
    expect(outbox?.status).toBe("sent");

    expect(await authorizeEmailLink({ email: user.email, token })).toEqual({ id: user.id, email: user.email, name: user.name });
    expect(await authorizeEmailLink({ email: user.email, token })).toBeNull();
  });

  it("gives the same answer for an unknown address and sends nothing", async () => {
    const ghost = uniqueEmail("nobody");
    const res = await callRoute<{ message: string }>(requestLink, "/api/auth/email-link", { method: "POST", body: { email: ghost } });
    expect(res.status).toBe(200);
    expect(res.json.message).toMatch(/If an account uses this address/);
    await new Promise((r) => setTimeout(r, 300));
    expect(await listCaughtMail(ghost)).toEqual([]);
    expect(await testDb().select().from(verificationTokens).where(eq(verificationTokens.identifier, ghost))).toEqual([]);
  });

  it("refuses a token for another address, a made-up token and an expired one", async () => {
    const user = await createTestUser("link-checks");
    const other = await createTestUser("link-other");
    const token = await issueSignInToken(user.email);
    expect(await authorizeEmailLink({ email: other.email, token })).toBeNull();
    expect(await authorizeEmailLink({ email: user.email, token: "x".repeat(43) })).toBeNull();
    const old = await issueSignInToken(user.email, new Date(Date.now() - SIGN_IN_LINK_TTL_MS - 1000));
    expect(await authorizeEmailLink({ email: user.email, token: old })).toBeNull();
    expect(await authorizeEmailLink({ email: user.email, token })).toMatchObject({ id: user.id });
  });

  it(`answers 429 after ${MAX_LINK_REQUESTS} requests for one address inside the window`, async () => {
    const user = await createTestUser("link-flood");
    for (let i = 0; i < MAX_LINK_REQUESTS; i++) {
      expect((await callRoute(requestLink, "/api/auth/email-link", { method: "POST", body: { email: user.email } })).status).toBe(200);
    }
    const res = await callRoute<{ error: string }>(requestLink, "/api/auth/email-link", { method: "POST", body: { email: user.email } });
    expect(res.status).toBe(429);
    expect(res.json.error).toMatch(/wait 15 minutes/);
  });

  it("answers a bad address with 400 on the email field", async () => {
    const res = await callRoute<{ issues: { path: string; message: string }[] }>(requestLink, "/api/auth/email-link", { method: "POST", body: { email: "<script>@" } });
    expect(res.status).toBe(400);
    expect(res.json.issues[0]).toEqual({ path: "email", message: expect.stringMatching(/valid e-mail/) });
  });
});
