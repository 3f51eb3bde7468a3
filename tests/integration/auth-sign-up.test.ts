/**
 * Sign-up and bad input against the real database: clear 400/409 answers with field paths, and
 * names carrying SQL or HTML stored verbatim as plain text.
 */
import { afterAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { closeDb, testDb } from "./support/database";
import { callRoute } from "./support/session";
import { uniqueEmail, createTestUser } from "./support/fixtures";
import { auditLog, users, workspaces } from "@/db/schema";
import { POST as signUp } from "@/app/api/auth/sign-up/route";
import { POST as createWorkspaceRoute } from "@/app/api/workspaces/route";
import { authorizePassword } from "@/lib/auth/credentials";

afterAll(closeDb);

interface ErrorBody {
  error: string;
  issues: { path: string; message: string }[];
}

const signUpAs = (body: unknown) => callRoute<ErrorBody & { user: { id: string; email: string; name: string } }>(signUp, "/api/auth/sign-up", { method: "POST", body });

describe("POST /api/auth/sign-up", () => {
  it("creates the account with a bcrypt hash (never the password), audits it, and the password then signs in", async () => {
    const email = uniqueEmail("newcomer");
    const res = await signUpAs({ name: "Ines Baptiste", email: email.toUpperCase(), password: "tall-column-brace-77" });
    expect(res.status).toBe(201);
    expect(res.json.user).toEqual({ id: expect.any(String), email, name: "Ines Baptiste" });
    const [row] = await testDb().select().from(users).where(eq(users.email, email));
    expect(row?.passwordHash).toMatch(/^\$2[aby]\$10\$/);
    expect(row?.passwordHash).not.toContain("tall-column");
    const audit = await testDb().select().from(auditLog).where(and(eq(auditLog.entity, "user"), eq(auditLog.entityId, res.json.user.id)));
    expect(audit).toHaveLength(1);
    expect(JSON.stringify(audit[0]?.after)).not.toContain("$2");
    expect(await authorizePassword({ email, password: "tall-column-brace-77" })).toMatchObject({ email });
  });

  it("refuses a reused address (any letter case) with 409 on the email field", async () => {
    const existing = await createTestUser("taken");
    const res = await signUpAs({ name: "Someone Else", email: existing.email.toUpperCase(), password: "another-long-phrase-9" });
    expect(res.status).toBe(409);
    expect(res.json.issues).toEqual([{ path: "email", message: expect.stringContaining("already exists") }]);
  });

  it.each([
    ["short", "short-1", /at least 10/],
    ["most-guessed", "Password123", /commonly guessed/],
    ["one repeated character", "aaaaaaaaaaaa", /more than two different/],
    ["a run of keys", "0123456789", /commonly guessed|run of consecutive/],
    ["built from the address", "carlotta-mendes-2026", /e-mail address/],
    ["over bcrypt's 72 bytes", "é".repeat(40), /72 bytes/],
  ])("refuses a weak password (%s) with 400 and a clear message on the password field", async (_label, password, message) => {
    const res = await signUpAs({ name: "Carlotta Mendes", email: `carlotta-mendes-${Date.now()}@firm.test`, password });
    expect(res.status).toBe(400);
    const issue = res.json.issues.find((i) => i.path === "password");
    expect(issue?.message).toMatch(message);
  });

  it.each([
    ["a bad e-mail", { name: "Ana", email: "not-an-address", password: "stair-tower-core-31" }, "email", /valid e-mail/],
    ["an over-long e-mail", { name: "Ana", email: `${"a".repeat(250)}@firm.test`, password: "stair-tower-core-31" }, "email", /at most 254/],
    ["an over-long name", { name: "N".repeat(121), email: uniqueEmail(), password: "stair-tower-core-31" }, "name", /at most 120/],
    ["an empty name", { name: "   ", email: uniqueEmail(), password: "stair-tower-core-31" }, "name", /enter your name/],
    ["a control character in the name", { name: "Ana\u0000Lee", email: uniqueEmail(), password: "stair-tower-core-31" }, "name", /control characters/],
    ["a number for a name", { name: 42, email: uniqueEmail(), password: "stair-tower-core-31" }, "name", /enter your name/],
  ])("answers %s with 400 and the field's message", async (_label, body, path, message) => {
    const res = await signUpAs(body);
    expect(res.status).toBe(400);
    expect(res.json.issues.find((i) => i.path === path)?.message).toMatch(message);
    expect(await testDb().select().from(users).where(eq(users.email, String(body.email).toLowerCase()))).toEqual([]);
  });

  it("answers a body that is not JSON with 400", async () => {
    const res = await signUpAs("{not json");
    expect(res.status).toBe(400);
    expect(res.json.error).toMatch(/not valid JSON/);
  });

  it("stores SQL and HTML in a name verbatim, as plain text, and the tables are intact", async () => {
    const name = `Robert'); DROP TABLE users; -- <script>alert("x")</script>`;
    const email = uniqueEmail("bobby");
    const res = await signUpAs({ name, email, password: "mezzanine-slab-edge-5" });
    expect(res.status).toBe(201);
    const [row] = await testDb().select().from(users).where(eq(users.email, email));
    expect(row?.name).toBe(name);
    expect((await testDb().select().from(users)).length).toBeGreaterThan(0);
  });
});

describe("bad input on workspace creation", () => {
  it("refuses an over-long or empty workspace name with 400 and stores SQL/HTML names as plain text", async () => {
    const owner = await createTestUser("ws-input");
    const long = await callRoute<ErrorBody>(createWorkspaceRoute, "/api/workspaces", { method: "POST", user: owner, body: { name: "W".repeat(121) } });
    expect(long.status).toBe(400);
    expect(long.json.issues[0]).toEqual({ path: "name", message: expect.stringMatching(/at most 120/) });
    const empty = await callRoute<ErrorBody>(createWorkspaceRoute, "/api/workspaces", { method: "POST", user: owner, body: {} });
    expect(empty.status).toBe(400);
    expect(empty.json.issues[0]?.path).toBe("name");
    const name = `<img src=x onerror=alert(1)> & Partners'; DELETE FROM workspaces; --`;
    const ok = await callRoute<{ workspace: { id: string } }>(createWorkspaceRoute, "/api/workspaces", { method: "POST", user: owner, body: { name } });
    expect(ok.status).toBe(201);
    const [row] = await testDb().select().from(workspaces).where(eq(workspaces.id, ok.json.workspace.id));
    expect(row?.name).toBe(name);
    expect(row?.slug).toMatch(/^[a-z0-9-]+$/);
  });
});
