/**
 * Form reuse across a project: marks without searches are searched from the screen, the chart of
 * total cost against distinct outlines appears, and an engineer adopts the one-outline set, after
 * which every mark carries a design of that outline. Invented test data.
 */
import { test, expect } from "@playwright/test";
import { createProjectWithMark, signInAsEngineer, uniqueName } from "./projects-support";

const design = { section: { shape: "rect", b: 18, h: 18, fc: 5, fy: 60, confinement: "tied", cover: 1.5, layout: { type: "perimeter", size: "#8", nb: 3, nh: 3 } }, braceLevels: 0 };
const markBody = (label: string, lu: number) => ({ label, level: "Podium", quantity: 4, member: { lu, kx: 1, ky: 1, braced: true }, limits: {}, design });

test("an engineer searches the missing marks and adopts a one-outline set for the whole project", async ({ page }) => {
  test.setTimeout(240_000);
  const workspaceId = await signInAsEngineer(page);
  const { base, projectId, markId } = await createProjectWithMark(page, workspaceId, uniqueName("Podium block"), markBody("P-1", 240));
  const second = await page.request.post(`/api/projects/${projectId}/marks`, { data: markBody("P-2", 168) });
  expect(second.status()).toBe(201);
  const secondId = ((await second.json()) as { mark: { id: string } }).mark.id;
  for (const [id, Pu] of [[markId, 380], [secondId, 220]] as const) {
    const res = await page.request.post(`/api/marks/${id}/loads`, { data: { name: "1.2D+1.6L", Pu, betaDns: 0.6, Mx: { M1: 350, M2: 800, curvature: "single" } } });
    expect(res.status()).toBe(201);
  }

  await page.goto(`${base}/form-reuse`);
  await expect(page.getByRole("heading", { name: "Form reuse", exact: true })).toBeVisible();
  await expect(page.getByText("2 mark(s) have no finished search yet")).toBeVisible();
  await page.getByRole("button", { name: "Search the missing marks" }).click();
  // The screen polls until both searches have finished, then shows one choice per N.
  const nOne = page.getByRole("button", { name: /^N = 1: \$/ });
  await expect(nOne).toBeVisible({ timeout: 180_000 });
  await expect(page.getByRole("img", { name: /Total cost against the number of distinct section outlines/ })).toBeVisible();
  await nOne.click();
  await expect(page.getByRole("heading", { name: "N = 1", exact: true })).toBeVisible();
  await expect(page.getByRole("cell", { name: "P-1", exact: true })).toBeVisible();
  await expect(page.getByRole("cell", { name: "P-2", exact: true })).toBeVisible();
  await page.getByLabel("Comment for the team").fill("one form set for the podium");
  await page.getByRole("button", { name: "Adopt this set for all 2 marks" }).click();
  await expect(page.getByRole("status").filter({ hasText: "Adopted:" })).toBeVisible();

  // Both marks now carry designs of the same outline (rotations share a form set).
  const outlines = new Set<string>();
  for (const id of [markId, secondId]) {
    const res = await page.request.get(`/api/marks/${id}`);
    expect(res.status()).toBe(200);
    const section = ((await res.json()) as { mark: { design: { section: { b: number; h: number } } } }).mark.design.section;
    outlines.add([section.b, section.h].sort((a, b) => a - b).join("x"));
  }
  expect(outlines.size).toBe(1);
  await expect(page.getByText(/ACI 318-19 · Caryatid supports/)).toBeVisible();
});
