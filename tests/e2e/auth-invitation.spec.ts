/**
 * Signing up, starting a workspace, inviting a colleague and their acceptance from the caught mail
 * in a second browser context; then sign-in with a password and with a one-time link, sign-out,
 * roles in the members table, and another workspace's pages answering 404.
 */
import { test, expect, type Page } from "@playwright/test";
import { linkFrom, waitForMail } from "../integration/support/mail-catcher";
import { DEMO_ACCOUNTS } from "../../lib/demo-accounts";

const run = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;

function demo(role: string) {
  const account = DEMO_ACCOUNTS.find((a) => a.role === role);
  if (!account) throw new Error(`no demo ${role}`);
  return account;
}

async function signInWithPassword(page: Page, email: string, password: string) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail", { exact: true }).fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
}

test("sign up, start a workspace, sign in, invite a colleague who accepts from the caught mail and lands with the invited role", async ({ page, browser }) => {
  const ownerEmail = `founder-${run}@e2e.test`;
  const colleagueEmail = `colleague-${run}@e2e.test`;
  const workspaceName = `Brandvold Ekwueme Engineers ${run}`;

  // Sign up; the form checks the password with the server's own rules before sending.
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Sigrun Brandvold");
  await page.getByLabel("Work e-mail").fill(ownerEmail);
  await page.getByLabel("Password").fill("short");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByText("use at least 10 characters")).toBeVisible();
  await page.getByLabel("Password").fill("slender-pier-magnifier-42");
  await page.getByRole("button", { name: "Create account" }).click();

  // No workspace yet: the empty state offers to start one.
  await expect(page.getByRole("heading", { name: "You are not in a workspace yet" })).toBeVisible();
  await page.getByLabel("Workspace name").fill(workspaceName);
  await page.getByRole("button", { name: "Create workspace" }).click();
  await expect(page).toHaveURL(/\/w\/[0-9a-f-]{36}$/);
  const workspaceUrl = new URL(page.url()).pathname;
  await expect(page.getByRole("combobox", { name: "Workspace" })).toHaveValue(workspaceUrl.split("/")[2] ?? "");
  await expect(page.getByText("licensed engineer").first()).toBeVisible();

  // Sign out and back in with the password: the workspace is the one the owner lands in.
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  await signInWithPassword(page, ownerEmail, "slender-pier-magnifier-42");
  await expect(page).toHaveURL(new RegExp(`${workspaceUrl}$`));

  // Invite a colleague as estimator.
  await page.getByRole("navigation", { name: "Workspace" }).getByRole("link", { name: "Members" }).click();
  await expect(page.getByRole("heading", { name: "Members" })).toBeVisible();
  const invite = page.getByRole("region", { name: "Invite a colleague" });
  await invite.getByLabel("E-mail").fill("not an address");
  await invite.getByRole("button", { name: "Send invitation" }).click();
  await expect(invite.getByText("enter a valid e-mail address")).toBeVisible();
  await invite.getByLabel("E-mail").fill(colleagueEmail);
  await invite.getByLabel("Role").selectOption("estimator");
  await invite.getByRole("button", { name: "Send invitation" }).click();
  await expect(invite.getByText(`Invitation sent to ${colleagueEmail}.`)).toBeVisible();
  await expect(invite.getByText(colleagueEmail, { exact: true })).toBeVisible();

  // The owner sees the message in the app's captured mail too.
  await page.getByRole("navigation", { name: "Workspace" }).getByRole("link", { name: "Mail" }).click();
  await expect(page.getByText(`to ${colleagueEmail}`)).toBeVisible();

  // The colleague opens the link from the caught mail in a browser of their own.
  const mail = await waitForMail(colleagueEmail, { subject: "Join" });
  expect(mail.text).toContain(workspaceName);
  const link = linkFrom(mail, "/invitations/accept");
  const colleagueContext = await browser.newContext();
  const colleague = await colleagueContext.newPage();
  await colleague.goto(link.pathname + link.search);
  await expect(colleague.getByRole("heading", { name: `Join ${workspaceName}` })).toBeVisible();
  await expect(colleague.getByText("as estimator", { exact: false })).toBeVisible();
  await colleague.getByLabel("Your name").fill("Chidi Ekwueme");
  await colleague.getByLabel("Choose a password").fill("column-schedule-tie-87");
  await colleague.getByRole("button", { name: "Create account and join" }).click();
  await expect(colleague).toHaveURL(new RegExp(`${workspaceUrl}$`));
  await expect(colleague.getByRole("combobox", { name: "Workspace" })).toHaveValue(workspaceUrl.split("/")[2] ?? "");
  await expect(colleague.getByRole("combobox", { name: "Workspace" }).locator("option:checked")).toHaveText(`${workspaceName} · estimator`);
  await colleague.goto(`${workspaceUrl}/members`);
  await expect(colleague.getByText("You are an estimator here")).toBeVisible();
  // An estimator sees no captured mail link and cannot invite.
  await expect(colleague.getByRole("navigation", { name: "Workspace" }).getByRole("link", { name: "Mail" })).toHaveCount(0);
  await expect(colleague.getByRole("region", { name: "Invite a colleague" })).toHaveCount(0);

  // The link worked once.
  await colleague.goto(link.pathname + link.search);
  await expect(colleague.getByRole("heading", { name: "This invitation has been used" })).toBeVisible();
  await colleagueContext.close();

  // The owner sees the new member with the invited role, and may change it.
  await page.goto(`${workspaceUrl}/members`);
  const row = page.getByTestId(`member-${colleagueEmail}`);
  await expect(row.getByRole("combobox")).toHaveValue("estimator");
  await row.getByRole("combobox").selectOption("engineer");
  await expect(page.getByText("Chidi Ekwueme is now engineer.")).toBeVisible();

  // The last owner cannot demote themselves; the server's reason shows beside the role.
  const me = page.getByTestId(`member-${ownerEmail}`);
  await me.getByRole("combobox").selectOption("reviewer");
  await expect(me.getByRole("alert")).toContainText("last owner cannot be demoted");
  await expect(me.getByRole("combobox")).toHaveValue("owner");
});

test("password sign-in: a wrong password is refused clearly; the right one lands in the workspace; sign-out ends the session", async ({ page }) => {
  const engineer = demo("engineer");
  await signInWithPassword(page, engineer.email, "not-the-right-password");
  await expect(page.getByRole("alert").filter({ hasText: "The e-mail address or the password is not right." })).toBeVisible();
  await signInWithPassword(page, engineer.email, engineer.password);
  await expect(page).toHaveURL(/\/w\/[0-9a-f-]{36}$/);
  await expect(page.getByRole("combobox", { name: "Workspace" }).locator("option:checked")).toContainText("engineer");

  const cookies = await page.context().cookies();
  const session = cookies.find((c) => c.name.endsWith("next-auth.session-token"));
  expect(session?.httpOnly).toBe(true);
  expect(session?.sameSite).toBe("Lax");
  expect(session?.expires).toBeGreaterThan(Date.now() / 1000);

  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  await page.goto("/account");
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=%2Faccount/);
});

test("one-time link: requested by e-mail, read from the caught mail, signs in once", async ({ page, browser }) => {
  const reviewer = demo("reviewer");
  await page.goto("/sign-in");
  const after = (await waitForMail(reviewer.email, { timeoutMs: 1 }).catch(() => null))?.id ?? 0;
  await page.getByLabel("E-mail for the link").fill(reviewer.email);
  await page.getByRole("button", { name: "E-mail me a link" }).click();
  await expect(page.getByRole("heading", { name: "Check your e-mail" })).toBeVisible();
  const mail = await waitForMail(reviewer.email, { subject: "sign-in link", after });
  const link = linkFrom(mail, "/sign-in/link");
  await page.goto(link.pathname + link.search);
  await page.getByRole("button", { name: "Sign in to Caryatid" }).click();
  await expect(page).toHaveURL(/\/w\/[0-9a-f-]{36}$/);
  await expect(page.getByRole("combobox", { name: "Workspace" }).locator("option:checked")).toContainText("reviewer");

  const other = await browser.newContext();
  const second = await other.newPage();
  await second.goto(link.pathname + link.search);
  await second.getByRole("button", { name: "Sign in to Caryatid" }).click();
  await expect(second.getByRole("alert").filter({ hasText: "already been used or has expired" })).toBeVisible();
  await other.close();
});

test("another workspace's pages answer 404 and signed-out visitors are sent to sign-in", async ({ page }) => {
  const estimator = demo("estimator");
  await page.goto("/w/00000000-0000-4000-8000-000000000000/members");
  await expect(page).toHaveURL(/\/sign-in\?callbackUrl=/);
  await signInWithPassword(page, estimator.email, estimator.password);
  await expect(page).toHaveURL(/\/w\/[0-9a-f-]{36}/);
  const response = await page.goto("/w/00000000-0000-4000-8000-000000000000/members");
  expect(response?.status()).toBe(404);
  await page.goto("/account");
  await expect(page.getByRole("heading", { name: "Account" })).toBeVisible();
  await expect(page.getByRole("heading", { name: "Your workspaces" })).toBeVisible();
});
