import { test, expect } from "@playwright/test";

test("the first page names the product and offers sign-in, and stays on loopback", async ({ page }) => {
  const foreign: string[] = [];
  page.on("request", (request) => {
    const url = new URL(request.url());
    if (url.protocol.startsWith("http") && url.hostname !== "127.0.0.1") foreign.push(request.url());
  });
  await page.goto("/");
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Caryatid");
  await expect(page.getByRole("link", { name: "Sign in", exact: true })).toBeVisible();
  await expect(page.getByText("licensed engineer")).toBeVisible();
  // Let late requests (link prefetches, fonts) happen before judging where they went.
  await page.waitForLoadState("load");
  await page.waitForTimeout(1500);
  expect(foreign).toEqual([]);
});

test("the health route reports the database up", async ({ request }) => {
  const response = await request.get("/api/health");
  expect(response.status()).toBe(200);
  expect(await response.json()).toEqual({ ok: true, db: "up" });
});
