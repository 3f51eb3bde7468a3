/**
 * E-mail + password sign-in through the same authorize function next-auth's "password" provider
 * calls, against the real database: the rate limit on failed attempts, and changing a password.
 */
import { afterAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { closeDb, testDb } from "./support/database";
import { callRoute, sessionCookieFor, sessionCookieName } from "./support/session";
import { GET as accountGet } from "@/app/api/auth/account/route";
import { createTestUser, uniqueEmail } from "./support/fixtures";
import { auditLog, signInAttempts, users } from "@/db/schema";
import { authorizePassword, clientAddressOf, RATE_LIMITED } from "@/lib/auth/credentials";
import { ATTEMPT_WINDOW_MS, MAX_FAILED_ATTEMPTS, MAX_FAILED_ATTEMPTS_PER_CLIENT } from "@/db/queries/sign-in-attempts";
import { POST as changePasswordRoute } from "@/app/api/auth/password/route";

afterAll(closeDb);

describe("authorizePassword", () => {
  it("returns the user for the right password, null for a wrong one or an unknown address", async () => {
    const user = await createTestUser("pw");
    expect(await authorizePassword({ email: user.email.toUpperCase(), password: user.password })).toEqual({ id: user.id, email: user.email, name: user.name });
    expect(await authorizePassword({ email: user.email, password: "not-the-password" })).toBeNull();
    expect(await authorizePassword({ email: uniqueEmail("ghost"), password: "whatever-it-is" })).toBeNull();
    expect(await authorizePassword({ email: "not an address", password: "x" })).toBeNull();
  });

  it(`refuses every attempt, even the right password, after ${MAX_FAILED_ATTEMPTS} failures, for that address only`, async () => {
    const user = await createTestUser("limited");
    const other = await createTestUser("unaffected");
    for (let i = 0; i < MAX_FAILED_ATTEMPTS; i++) {
      expect(await authorizePassword({ email: user.email, password: `wrong-guess-${i}` })).toBeNull();
    }
    await expect(authorizePassword({ email: user.email, password: user.password })).rejects.toThrow(RATE_LIMITED);
    await expect(authorizePassword({ email: user.email, password: "wrong-again" })).rejects.toThrow(RATE_LIMITED);
    expect(await authorizePassword({ email: other.email, password: other.password })).toMatchObject({ id: other.id });

    // Once the failures are older than the window, the right password works again.
    await testDb()
      .update(signInAttempts)
      .set({ at: new Date(Date.now() - ATTEMPT_WINDOW_MS - 1000) })
      .where(eq(signInAttempts.key, user.email));
    expect(await authorizePassword({ email: user.email, password: user.password })).toMatchObject({ id: user.id });
  });

  it(`refuses a client after ${MAX_FAILED_ATTEMPTS_PER_CLIENT} failures spread over many addresses (one password tried on many accounts)`, async () => {
    // 203.0.113.0/24 is TEST-NET-3, reserved for documentation (RFC 5737): no real client has it.
    const sprayer = `203.0.113.${Math.floor(Math.random() * 250) + 1}-${Date.now()}`;
    const victim = await createTestUser("sprayed");
    for (let i = 0; i < MAX_FAILED_ATTEMPTS_PER_CLIENT; i++) {
      expect(await authorizePassword({ email: uniqueEmail(`spray-${i}`), password: "Summer-2026-season" }, sprayer)).toBeNull();
    }
    await expect(authorizePassword({ email: victim.email, password: victim.password }, sprayer)).rejects.toThrow(RATE_LIMITED);
    expect(await authorizePassword({ email: victim.email, password: victim.password }, "198.51.100.7")).toMatchObject({ id: victim.id });
  }, 90_000);

  it("reads the client address from X-Forwarded-For as Next.js passes it", () => {
    expect(clientAddressOf({ "x-forwarded-for": "198.51.100.7, 10.0.0.1" })).toBe("198.51.100.7");
    expect(clientAddressOf(new Headers({ "x-forwarded-for": "::1" }))).toBe("::1");
    expect(clientAddressOf({})).toBeNull();
    expect(clientAddressOf(undefined)).toBeNull();
  });

  it("counts failures against addresses that have no account too (no free guessing of who exists)", async () => {
    const ghost = uniqueEmail("ghost");
    for (let i = 0; i < MAX_FAILED_ATTEMPTS; i++) await authorizePassword({ email: ghost, password: `guess-${i}-guess` });
    await expect(authorizePassword({ email: ghost, password: "guess-final-guess" })).rejects.toThrow(RATE_LIMITED);
  });
});

describe("POST /api/auth/password", () => {
  it("changes the password after checking the current one; the old one stops working; the audit row has no hash", async () => {
    const user = await createTestUser("changer");
    const res = await callRoute(changePasswordRoute, "/api/auth/password", {
      method: "POST", user, body: { currentPassword: user.password, newPassword: "braced-frame-column-88" },
    });
    expect(res.status).toBe(200);
    expect(await authorizePassword({ email: user.email, password: "braced-frame-column-88" })).toMatchObject({ id: user.id });
    expect(await authorizePassword({ email: user.email, password: user.password })).toBeNull();
    const audit = await testDb().select().from(auditLog).where(and(eq(auditLog.entityId, user.id), eq(auditLog.action, "change-password")));
    expect(audit).toHaveLength(1);
    const [row] = await testDb().select().from(users).where(eq(users.id, user.id));
    expect(JSON.stringify(audit)).not.toContain(row?.passwordHash ?? "never");
    expect(JSON.stringify(audit)).not.toContain("braced-frame");
  });

  it("ends every session issued before the change and re-issues the changer's own", async () => {
    const user = await createTestUser("sessions");
    const otherDevice = await sessionCookieFor(user);
    expect((await callRoute(accountGet, "/api/auth/account", { cookie: otherDevice })).status).toBe(200);
    const res = await callRoute(changePasswordRoute, "/api/auth/password", {
      method: "POST", cookie: otherDevice, body: { currentPassword: user.password, newPassword: "shear-wall-boundary-64" },
    });
    expect(res.status).toBe(200);
    expect((await callRoute(accountGet, "/api/auth/account", { cookie: otherDevice })).status).toBe(401);

    const setCookie = res.response.headers.get("set-cookie") ?? "";
    expect(setCookie).toMatch(new RegExp(`^${sessionCookieName()}=`));
    expect(setCookie).toMatch(/HttpOnly/i);
    expect(setCookie).toMatch(/SameSite=lax/i);
    const fresh = setCookie.split(";")[0] ?? "";
    expect((await callRoute(accountGet, "/api/auth/account", { cookie: fresh })).status).toBe(200);
  });

  it("refuses a wrong current password (422), a reused one and a weak one (400), each on its field", async () => {
    const user = await createTestUser("refused");
    const wrong = await callRoute<{ issues: { path: string; message: string }[] }>(changePasswordRoute, "/api/auth/password", {
      method: "POST", user, body: { currentPassword: "not-my-password", newPassword: "precast-corbel-seat-21" },
    });
    expect(wrong.status).toBe(422);
    expect(wrong.json.issues).toEqual([{ path: "currentPassword", message: expect.stringContaining("not your current password") }]);
    const reused = await callRoute<{ issues: { path: string; message: string }[] }>(changePasswordRoute, "/api/auth/password", {
      method: "POST", user, body: { currentPassword: user.password, newPassword: user.password },
    });
    expect(reused.status).toBe(400);
    expect(reused.json.issues).toEqual([{ path: "newPassword", message: "the new password must differ from the current one" }]);
    const weak = await callRoute<{ issues: { path: string; message: string }[] }>(changePasswordRoute, "/api/auth/password", {
      method: "POST", user, body: { currentPassword: user.password, newPassword: "qwertyuiop" },
    });
    expect(weak.status).toBe(400);
    expect(weak.json.issues[0]?.path).toBe("newPassword");
    expect(await authorizePassword({ email: user.email, password: user.password })).toMatchObject({ id: user.id });
  });

  it("needs a session (401)", async () => {
    const res = await callRoute(changePasswordRoute, "/api/auth/password", { method: "POST", body: { currentPassword: "a", newPassword: "granite-lintel-9999" } });
    expect(res.status).toBe(401);
  });
});
