/**
 * A tall lobby column that fails once slenderness is included passes after its section is
 * enlarged on the mark's form: the check view's verdict, sketch and magnifier chain follow the
 * saved design. Invented test data.
 */
import { test, expect } from "@playwright/test";
import { createProjectWithMark, signInAsEngineer, uniqueName } from "./projects-support";

const MARK = {
  label: "L-2",
  level: "Lobby",
  quantity: 4,
  member: { lu: 312, kx: 1, ky: 1, braced: true },
  limits: { note: "double-height lobby" },
  design: { section: { shape: "rect", b: 18, h: 18, fc: 5, fy: 60, confinement: "tied", cover: 1.5, layout: { type: "perimeter", size: "#9", nb: 3, nh: 3 } }, braceLevels: 0 },
};

test("editing a failing mark's section makes it pass in the check view", async ({ page }) => {
  const workspaceId = await signInAsEngineer(page);
  const { base, markId, projectId } = await createProjectWithMark(page, workspaceId, uniqueName("Section edit"), MARK);
  for (const load of [
    { name: "1.4D", Pu: 420, betaDns: 1, Mx: { M1: 300, M2: 620, curvature: "single" } },
    { name: "1.2D+1.6L", Pu: 505, betaDns: 0.6, Mx: { M1: 420, M2: 860, curvature: "single" }, My: { M1: 0, M2: 120, curvature: "double" } },
  ]) {
    const res = await page.request.post(`/api/marks/${markId}/loads`, { data: load });
    expect(res.status()).toBe(201);
  }

  await page.goto(`${base}/marks/${markId}/check`);
  await expect(page.getByTestId("verdict-headline")).toContainText("Mark L-2 (Lobby) fails");
  await expect(page.getByTestId("verdict")).toContainText("it fails because of slenderness");
  await expect(page.getByTestId("section-sketch").getByTestId("sketch-bar")).toHaveCount(8);
  await expect(page.getByTestId("magnifier-x")).toContainText("6.6.4.5.2");

  await page.getByRole("link", { name: "Edit the mark and its loads" }).click();
  await page.getByLabel(/^b \(width/).fill("24");
  await page.getByLabel(/^h \(depth/).fill("24");
  await page.getByLabel(/^Bars along each b face/).fill("4");
  await page.getByLabel(/^Bars along each h face/).fill("4");
  await page.getByRole("button", { name: "Save the mark" }).click();
  await expect(page.getByText("Saved.")).toBeVisible();

  await page.getByRole("link", { name: "Check this mark" }).click();
  await expect(page.getByTestId("verdict-headline")).toContainText("Mark L-2 (Lobby) passes with slenderness included");
  await expect(page.getByTestId("section-sketch").getByTestId("sketch-bar")).toHaveCount(12);
  await expect(page.getByTestId("interaction-chart-x").locator('[data-testid="load-point"][data-pass="no"]')).toHaveCount(0);

  // The project's list shows the new verdict too.
  await page.goto(base);
  await expect(page.getByTestId("verdict-L-2")).toContainText("passes");
  expect(projectId).toBeTruthy();
});

test("a stale save shows what changed", async ({ page }) => {
  const workspaceId = await signInAsEngineer(page);
  const { base, markId } = await createProjectWithMark(page, workspaceId, uniqueName("Stale"), MARK);
  await page.goto(`${base}/marks/${markId}`);
  await expect(page.getByLabel("Number of identical columns")).toHaveValue("4");
  // Someone else saves first.
  const other = await page.request.patch(`/api/marks/${markId}`, { data: { version: 1, quantity: 9 } });
  expect(other.status()).toBe(200);
  await page.getByLabel("Level", { exact: true }).fill("Lobby east");
  await page.getByRole("button", { name: "Save the mark" }).click();
  const alert = page.getByRole("alert").filter({ hasText: "someone else changed this first" });
  await expect(alert).toContainText("Number of columns: 4 → 9");
  await alert.getByRole("button", { name: "Load the current version" }).click();
  await expect(page.getByLabel("Number of identical columns")).toHaveValue("9");
});
