/**
 * Account settings and the server's field errors in the browser: a taken address on sign-up, a
 * wrong current password, renaming with HTML in the name (shown as plain text), and a changed
 * password that signs in afterwards.
 */
import { test, expect, type Page } from "@playwright/test";

const run = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;

async function signIn(page: Page, email: string, password: string) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail", { exact: true }).fill(email);
  await page.getByLabel("Password", { exact: true }).fill(password);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
}

test("account settings: server field errors beside the fields, a plain-text name, and a new password that works", async ({ page }) => {
  const email = `tove-${run}@e2e.test`;
  const first = "precast-stair-flight-12";
  const created = await page.request.post("/api/auth/sign-up", { data: { name: "Tove Amundsen", email, password: first } });
  expect(created.status()).toBe(201);

  // The same address again: the server's 409 lands under the e-mail field.
  await page.goto("/sign-up");
  await page.getByLabel("Your name").fill("Second Tove");
  await page.getByLabel("Work e-mail").fill(email);
  await page.getByLabel("Password").fill("another-long-phrase-93");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByText("an account with this e-mail address already exists")).toBeVisible();
  await expect(page.getByLabel("Work e-mail")).toHaveAttribute("aria-invalid", "true");

  await signIn(page, email, first);
  await expect(page.getByRole("heading", { name: "You are not in a workspace yet" })).toBeVisible();
  await page.getByRole("link", { name: "Account" }).first().click();
  await expect(page.getByRole("heading", { name: "Account", exact: true })).toBeVisible();

  const profile = page.getByRole("region", { name: "Profile" });
  await profile.getByLabel("Name").fill("<b>Tove</b> Amundsen-Berg");
  await profile.getByRole("button", { name: "Save name" }).click();
  await expect(profile.getByText("Your name is saved.")).toBeVisible();
  await expect(page.getByRole("banner").getByText("<b>Tove</b> Amundsen-Berg")).toBeVisible();

  const password = page.getByRole("region", { name: "Password" });
  await password.getByLabel("Current password").fill("not-my-password-at-all");
  await password.getByLabel("New password").fill("cast-in-place-core-wall-5");
  await password.getByRole("button", { name: "Change password" }).click();
  await expect(password.getByText("this is not your current password")).toBeVisible();
  await expect(password.getByLabel("Current password")).toHaveAttribute("aria-invalid", "true");

  await password.getByLabel("Current password").fill(first);
  await password.getByLabel("New password").fill(first);
  await password.getByRole("button", { name: "Change password" }).click();
  await expect(password.getByText("the new password must differ from the current one")).toBeVisible();

  await password.getByLabel("New password").fill("cast-in-place-core-wall-5");
  await password.getByRole("button", { name: "Change password" }).click();
  await expect(password.getByText("Your password is changed.")).toBeVisible();

  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page).toHaveURL(/\/sign-in/);
  await signIn(page, email, first);
  await expect(page.getByRole("alert").filter({ hasText: "not right" })).toBeVisible();
  await signIn(page, email, "cast-in-place-core-wall-5");
  await expect(page).toHaveURL(/\/w(\?|$)/);
});

test("a person in two workspaces switches between them with the workspace switcher", async ({ page }) => {
  const email = `two-firms-${run}@e2e.test`;
  const created = await page.request.post("/api/auth/sign-up", { data: { name: "Ola Nakamura", email, password: "two-way-slab-span-31" } });
  expect(created.status()).toBe(201);
  await signIn(page, email, "two-way-slab-span-31");
  await page.getByLabel("Workspace name").fill(`Nakamura Lund ${run}`);
  await page.getByRole("button", { name: "Create workspace" }).click();
  await expect(page).toHaveURL(/\/w\/[0-9a-f-]{36}$/);
  const firstId = new URL(page.url()).pathname.split("/")[2] ?? "";

  const switcher = page.getByRole("combobox", { name: "Workspace" });
  await switcher.selectOption({ label: "+ New workspace…" });
  await expect(page.getByRole("heading", { name: "Start another workspace" })).toBeVisible();
  await page.getByLabel("Workspace name").fill(`Nakamura Side Practice ${run}`);
  await page.getByRole("button", { name: "Create workspace" }).click();
  await expect(page).not.toHaveURL(new RegExp(firstId));
  await expect(switcher.locator("option:checked")).toHaveText(`Nakamura Side Practice ${run} · owner`);

  await switcher.selectOption(firstId);
  await expect(page).toHaveURL(new RegExp(`/w/${firstId}$`));
  await expect(switcher.locator("option:checked")).toHaveText(`Nakamura Lund ${run} · owner`);
});

test("repeated wrong passwords through the real sign-in endpoint lock the address for a while", async ({ page }) => {
  const email = `locked-${run}@e2e.test`;
  const created = await page.request.post("/api/auth/sign-up", { data: { name: "Lockie Park", email, password: "hollow-core-plank-77" } });
  expect(created.status()).toBe(201);
  for (let i = 0; i < 5; i++) {
    await signIn(page, email, `wrong-guess-${i}-abc`);
    await expect(page.getByRole("alert").filter({ hasText: "not right" })).toBeVisible();
  }
  await signIn(page, email, "hollow-core-plank-77");
  await expect(page.getByRole("alert").filter({ hasText: "Too many failed attempts" })).toBeVisible();
  await expect(page).toHaveURL(/\/sign-in/);
});

test("the signed-out pages fit a tablet and a laptop and every input has a label", async ({ page }) => {
  for (const width of [768, 1280]) {
    await page.setViewportSize({ width, height: 900 });
    for (const path of ["/sign-in", "/sign-up"]) {
      await page.goto(path);
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
      expect(overflow, `${path} at ${width}px`).toBeLessThanOrEqual(0);
      const unlabeled = await page.evaluate(() =>
        Array.from(document.querySelectorAll("input:not([type=hidden]), select"))
          .filter((el) => !(el as HTMLInputElement).labels?.length)
          .map((el) => el.outerHTML),
      );
      expect(unlabeled).toEqual([]);
    }
  }
});
