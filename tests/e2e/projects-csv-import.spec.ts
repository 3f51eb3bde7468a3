/**
 * Load combinations from a CSV with one bad row: the preview names the row and the column,
 * nothing is imported until the bad row is explicitly left out, the check shows the imported
 * combinations; the bad row is then fixed by typing it into the loads table, and the interaction
 * diagram (its plotted points) and the verdict change. The column is invented test data.
 */
import { test, expect } from "@playwright/test";
import { createProjectWithMark, signInAsEngineer, uniqueName } from "./projects-support";

const MARK = {
  label: "K-7",
  level: "L1",
  quantity: 2,
  member: { lu: 192, kx: 1, ky: 1, braced: true },
  design: { section: { shape: "rect", b: 16, h: 16, fc: 5, fy: 60, confinement: "tied", cover: 1.5, layout: { type: "perimeter", size: "#8", nb: 3, nh: 3 } }, braceLevels: 0 },
};

// Row 3 carries a typo in Pu ("48o"): the row the user fixes later.
const CSV = [
  "combination,Pu,Mx_M1,Mx_M2,Mx_curvature,betaDns",
  "1.4D,200,150,300,double,1",
  "1.2D+1.6L,260,200,420,double,0.55",
  "1.2D+1.6S,48o,700,1400,single,0.5",
].join("\n");

test("a CSV with one bad row: preview, explicit skip, fix in the table, and the diagram and verdict change", async ({ page }) => {
  const workspaceId = await signInAsEngineer(page);
  const { base, markId } = await createProjectWithMark(page, workspaceId, uniqueName("CSV import"), MARK);

  await page.goto(`${base}/marks/${markId}`);
  await expect(page.getByRole("heading", { name: /Mark K-7/ })).toBeVisible();
  const upload = page.getByRole("region", { name: "Upload load combinations" });
  await upload.getByLabel("CSV file").setInputFiles({ name: "frame-export.csv", mimeType: "text/csv", buffer: Buffer.from(CSV) });

  await expect(upload.getByTestId("import-summary")).toContainText("2 rows ready, 1 row with errors");
  await expect(upload.getByTestId("preview-row-error")).toContainText('row 3, Pu: "48o" is not a number');
  const importButton = upload.getByRole("button", { name: /^Import/ });
  await expect(importButton).toBeDisabled();
  await upload.getByLabel(/Leave out the 1 row with errors/).check();
  await importButton.click();
  await expect(upload.getByRole("status")).toContainText("Imported 2 load combinations; left out 1 row with errors");

  // The table now holds the two imported rows.
  await expect(page.getByTestId("load-row-1.4D")).toBeVisible();
  await expect(page.getByTestId("load-row-1.2D+1.6L")).toBeVisible();

  await page.getByRole("link", { name: "Check this mark" }).click();
  await expect(page.getByTestId("verdict-headline")).toContainText("Mark K-7 (L1) passes");
  const pointsX = page.getByTestId("interaction-chart-x").getByTestId("load-point");
  await expect(pointsX).toHaveCount(2);
  await expect(page.getByTestId("interaction-chart-x").locator("svg").first()).toBeVisible();
  const failingPoints = page.locator('[data-testid^="interaction-chart-"] [data-testid="load-point"][data-pass="no"]');
  await expect(failingPoints).toHaveCount(0);
  await expect(page.getByTestId("assumptions")).toContainText("ACI 318-19");
  await expect(page.getByTestId("caution")).toContainText("licensed engineer");

  // Fix the bad row by typing it into the table's empty row, by keyboard.
  await page.getByRole("link", { name: "← back to the mark" }).click();
  const name = page.getByLabel("Combination, row 3");
  await name.fill("1.2D+1.6S");
  await page.getByLabel("Pu (kip), row 3").fill("480");
  await page.getByLabel("Mx M1 (kip-in), row 3").fill("700");
  await page.getByLabel("Mx M2 (kip-in), row 3").fill("1400");
  await page.getByLabel("βdns, row 3").fill("0.5");
  await page.getByLabel("βdns, row 3").press("Enter");
  await expect(page.getByTestId("load-row-1.2D+1.6S").getByTestId("row-status")).toHaveText("saved");

  await page.getByRole("link", { name: "Check this mark" }).click();
  await expect(page.getByTestId("verdict-headline")).toContainText("Mark K-7 (L1) fails");
  await expect(pointsX).toHaveCount(3);
  // the new combination is plotted as failing (about whichever axis fails it)
  await expect(failingPoints.first()).toBeVisible();
  await expect(failingPoints.first()).toContainText("1.2D+1.6S");
  await expect(page.getByTestId("case-1.2D+1.6S")).toContainText("✗ fails");

  // The original file is kept with the import.
  const imports = await page.request.get(`/api/projects/${base.split("/").pop()}/imports`);
  const list = (await imports.json()) as { imports: Array<{ id: string; filename: string; rowsImported: number; rowsSkipped: number }> };
  expect(list.imports[0]).toMatchObject({ filename: "frame-export.csv", rowsImported: 2, rowsSkipped: 1 });
  const file = await page.request.get(`/api/projects/${base.split("/").pop()}/imports/${list.imports[0]?.id}`);
  expect(await file.text()).toBe(CSV);
});
