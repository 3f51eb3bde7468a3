/**
 * The alternatives flow end to end on a copy of a demo mark that fails once slenderness is
 * included (scripts/demo-building-data.ts, mark B-3, in a project of its own so other specs keep
 * the seeded building as it is): an estimator runs a small search and watches it finish, filters
 * the candidate table, compares two candidates and proposes one; an engineer approves it; the mark
 * then passes with the adopted design, goes stale when a load changes and is re-checked in one
 * click; the column schedule (CSV) and the calculation package (PDF) download.
 */
import { test, expect, type Browser, type BrowserContext, type Page } from "@playwright/test";
import { readFile } from "node:fs/promises";
import { listCaughtMail, waitForMail } from "../integration/support/mail-catcher";
import { DEMO_ACCOUNTS, DEMO_WORKSPACE } from "../../lib/demo-accounts";
import { DEMO_MARKS, DEMO_PRICE_BOOK, DEMO_PROJECT } from "../../scripts/demo-building-data";

const run = `${Date.now().toString(36)}${Math.random().toString(36).slice(2, 6)}`;

function demo(role: "owner" | "engineer" | "estimator" | "reviewer") {
  const account = DEMO_ACCOUNTS.find((a) => a.role === role);
  if (!account) throw new Error(`no demo ${role}`);
  return account;
}

async function signedIn(browser: Browser, role: "owner" | "engineer" | "estimator" | "reviewer"): Promise<{ context: BrowserContext; page: Page }> {
  const account = demo(role);
  const context = await browser.newContext({ acceptDownloads: true });
  const page = await context.newPage();
  await page.goto("/sign-in");
  await page.getByLabel("E-mail", { exact: true }).fill(account.email);
  await page.getByLabel("Password", { exact: true }).fill(account.password);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await expect(page).toHaveURL(/\/w(\/|$)/);
  return { context, page };
}

async function lastMailId(to: string): Promise<number> {
  const all = await listCaughtMail(to);
  return all.reduce((m, x) => Math.max(m, x.id), 0);
}

test("search a slender demo mark, filter, compare, propose as estimator, approve as engineer, re-check when stale, download the schedule and the package", async ({ browser }) => {
  test.setTimeout(240_000);
  const source = DEMO_MARKS.find((m) => m.mark.label === "B-3");
  if (!source || source.intent !== "fails-with-slenderness") throw new Error("demo mark B-3 should fail with slenderness");

  // Setup through the API as the owner: a project of this run with the demo price book and a copy of B-3.
  const owner = await signedIn(browser, "owner");
  const api = owner.context.request;
  const { workspaces } = (await (await api.get("/api/workspaces")).json()) as { workspaces: Array<{ id: string; name: string }> };
  const workspaceId = workspaces.find((w) => w.name === DEMO_WORKSPACE.name)?.id;
  expect(workspaceId).toBeTruthy();
  const projectRes = await api.post("/api/projects", { data: { ...DEMO_PROJECT, name: `Tidewater search check ${run}`, workspaceId } });
  expect(projectRes.status()).toBe(201);
  const { project } = (await projectRes.json()) as { project: { id: string } };
  // A new project starts with the default price book; the demo's prices replace it as the next revision.
  const { priceBook } = (await (await api.get(`/api/projects/${project.id}/price-book`)).json()) as { priceBook: { revision: number } | null };
  expect((await api.post(`/api/projects/${project.id}/price-book`, { data: { baseRevision: priceBook?.revision ?? 0, ...DEMO_PRICE_BOOK } })).status()).toBe(201);
  const markRes = await api.post(`/api/projects/${project.id}/marks`, { data: source.mark });
  expect(markRes.status()).toBe(201);
  const { mark } = (await markRes.json()) as { mark: { id: string } };
  for (const load of source.loads) expect((await api.post(`/api/marks/${mark.id}/loads`, { data: load })).status()).toBe(201);
  const markUrl = `/w/${workspaceId}/projects/${project.id}/marks/${mark.id}`;

  // The estimator sees the current design fail because of slenderness.
  const estimator = await signedIn(browser, "estimator");
  const e = estimator.page;
  await e.goto(`${markUrl}/check`);
  await expect(e.getByTestId("verdict-headline")).toContainText("fails");
  await expect(e.getByTestId("verdict")).toContainText("fails because of slenderness");

  // From the mark page to the search page; a small space so the search takes seconds.
  await e.goto(markUrl);
  await e.getByRole("link", { name: "Search alternatives" }).click();
  await expect(e.getByRole("heading", { name: "Alternatives for mark B-3" })).toBeVisible();
  const form = e.getByRole("form", { name: "Search space" });
  await form.getByLabel("Circular").uncheck();
  await form.getByLabel("b from").fill("16");
  await form.getByLabel("b to").fill("20");
  await form.getByLabel("h from").fill("16");
  await form.getByLabel("h to").fill("22");
  for (const fc of ["4", "8"]) await form.getByRole("group", { name: /f′c/ }).getByLabel(fc, { exact: true }).uncheck();
  for (const size of ["#6", "#7", "#10", "#11"]) await form.getByLabel(size, { exact: true }).uncheck();
  await form.getByRole("group", { name: "Intermediate brace levels" }).getByLabel("2", { exact: true }).uncheck();
  await form.getByRole("button", { name: "Start search" }).click();

  // Live progress, then finished: the bar reaches 100 % and the kept count is shown.
  const item = e.getByTestId("search-item").first();
  await expect(item.getByRole("progressbar", { name: "Search progress" })).toBeVisible({ timeout: 15_000 });
  await expect(item.getByTestId("search-status")).toHaveText("finished", { timeout: 120_000 });
  await expect(item.getByRole("progressbar")).toHaveAttribute("aria-valuenow", "100");
  const keptText = (await item.getByTestId("search-kept").textContent()) ?? "";
  const kept = Number(keptText.replace(/[^0-9]/g, ""));
  expect(kept).toBeGreaterThan(3);
  await item.getByRole("link", { name: "Open results" }).click();

  // Results: chart, basis and caution, every kept candidate in the table.
  await expect(e.getByRole("heading", { name: /Search results — mark B-3/ })).toBeVisible();
  await expect(e.getByTestId("front-chart").locator("svg").first()).toBeVisible();
  await expect(e.getByTestId("assumptions")).toContainText("ACI 318-19");
  await expect(e.getByTestId("caution")).toContainText("licensed engineer");
  await expect(e.getByTestId("current-summary")).toContainText("fails");
  const count = e.getByTestId("candidate-count");
  await expect(count).toContainText(`${kept} of ${kept} passing candidates shown`);
  await e.getByRole("radio", { name: "Carbon vs cost" }).click();
  await expect(e.getByTestId("front-chart")).toContainText("embodied carbon");
  await e.getByRole("radio", { name: "Cost vs utilization" }).click();

  // Filter by bar size and f'c: every row left matches, and fewer rows are left.
  const table = e.getByTestId("candidate-table");
  await e.getByLabel("Bar size").selectOption("#9");
  await e.getByLabel("f′c (ksi)", { exact: true }).selectOption("6");
  const filteredText = (await count.textContent()) ?? "";
  const filtered = Number(/^(\d+) of/.exec(filteredText)?.[1] ?? "-1");
  expect(filtered).toBeGreaterThan(0);
  expect(filtered).toBeLessThan(kept);
  const rows = table.getByTestId("candidate-row");
  await expect(rows).toHaveCount(Math.min(filtered, 25));
  for (const id of await rows.evaluateAll((els) => els.map((el) => el.getAttribute("data-candidate") ?? ""))) {
    expect(id).toMatch(/-f6-y60-\d+#9-/);
  }
  // A steel-ratio range the filtered rows cannot meet empties the table; clearing brings them all back.
  await e.getByLabel("Steel ratio ρ from").fill("0.079");
  await expect(count).toContainText(`0 of ${kept}`);
  await e.getByRole("button", { name: "clear filters" }).click();
  await expect(count).toContainText(`${kept} of ${kept}`);

  // Sort by utilization (ascending, then descending) from the keyboard.
  const utilHeader = table.getByRole("button", { name: /Utilization/ });
  await utilHeader.focus();
  await e.keyboard.press("Enter");
  await expect(table.locator("th").filter({ hasText: "Utilization" })).toHaveAttribute("aria-sort", "ascending");
  const utils = await rows.evaluateAll((els) => els.map((el) => Number(el.children[8]?.textContent ?? "NaN")));
  expect(utils).toEqual([...utils].sort((a, b) => a - b));
  // Back to cheapest first.
  await table.getByRole("button", { name: /Cost/ }).click();
  await expect(table.locator("th").filter({ hasText: "Cost" })).toHaveAttribute("aria-sort", "ascending");

  // Compare the two cheapest: each is re-checked by the engine and agrees with the search.
  const firstId = (await rows.nth(0).getAttribute("data-candidate")) ?? "";
  const secondId = (await rows.nth(1).getAttribute("data-candidate")) ?? "";
  const firstCost = ((await rows.nth(0).locator("td").nth(9).textContent()) ?? "").trim();
  await e.getByLabel(`Compare ${firstId}`).check();
  await e.getByLabel(`Compare ${secondId}`).check();
  const comparison = e.getByTestId("comparison");
  await expect(comparison.getByTestId("compare-card")).toHaveCount(2);
  await expect(comparison.getByTestId("compare-card").first().getByTestId("compare-utilization")).toContainText("✓");
  await expect(comparison.getByTestId("compare-card").first().getByTestId("compare-cost")).toContainText(firstCost);
  await expect(comparison.getByRole("img", { name: `Section of ${firstId}` })).toBeVisible();
  await expect(comparison.getByTestId("compare-cases").locator("tbody tr")).toHaveCount(source.loads.length);
  await expect(comparison.getByTestId("interaction-chart-x")).toHaveCount(2);
  await comparison.getByRole("radio", { name: "about y" }).click();
  await expect(comparison.getByTestId("interaction-chart-y")).toHaveCount(2);
  // The comparison survives a reload (it is kept in the address).
  await e.reload();
  await expect(e.getByTestId("comparison").getByTestId("compare-card")).toHaveCount(2);

  // Propose the cheapest for the mark; the estimator cannot approve.
  const engineerMail = demo("engineer").email;
  const mailBefore = await lastMailId(engineerMail);
  const propose = e.getByRole("form", { name: "Propose for this mark" });
  await propose.getByLabel("Candidate").selectOption(firstId);
  await propose.getByLabel("Comment for the engineer").fill("Cheapest passing section; keeps the mezzanine line clear.");
  await propose.getByRole("button", { name: "Propose" }).click();
  await expect(propose.getByRole("status")).toContainText(`Proposed ${firstId}`);
  const proposal = e.getByRole("listitem", { name: `Alternative ${firstId}` });
  await expect(proposal.getByTestId("alternative-status")).toHaveText("awaiting an engineer");
  await expect(proposal.getByRole("button", { name: "Approve and adopt" })).toHaveCount(0);
  const proposedMail = await waitForMail(engineerMail, { subject: "Alternative proposed for column B-3", after: mailBefore });
  expect(proposedMail.subject).toContain(firstId);

  // A search over the whole default space can be cancelled while it runs (or waits for a worker).
  await e.goto(`${markUrl}/searches`);
  await e.getByRole("form", { name: "Search space" }).getByRole("button", { name: "Start search" }).click();
  await expect(e.getByTestId("search-item")).toHaveCount(2);
  const big = e.getByTestId("search-item").first();
  await big.getByRole("button", { name: "Cancel search" }).click();
  await expect(big.getByTestId("search-status")).toHaveText("cancelled");
  await expect(big.getByRole("link", { name: "Open results" })).toHaveCount(0);
  await expect(e.getByTestId("search-item").nth(1).getByTestId("search-status")).toHaveText("finished");

  // The engineer approves it with a comment; turning down without one is refused beside the field.
  const engineer = await signedIn(browser, "engineer");
  const g = engineer.page;
  await g.goto(`${markUrl}/alternatives`);
  const pending = g.getByRole("listitem", { name: `Alternative ${firstId}` });
  await pending.getByRole("button", { name: "Turn down" }).click();
  await expect(pending.getByText("say why the alternative is rejected")).toBeVisible();
  const estimatorMail = demo("estimator").email;
  const estimatorBefore = await lastMailId(estimatorMail);
  await pending.getByLabel(/Comment/).fill("Agreed: fits the mezzanine framing.");
  await pending.getByRole("button", { name: "Approve and adopt" }).click();
  await expect(pending.getByTestId("alternative-status")).toHaveText("adopted");
  await waitForMail(estimatorMail, { subject: "Alternative approved for column B-3", after: estimatorBefore });

  // The mark now carries the adopted design, and it passes with slenderness included.
  await g.goto(`${markUrl}/check`);
  await expect(g.getByTestId("verdict-headline")).toContainText("passes");

  // A changed load makes the adoption stale; one click re-checks it and it is current again.
  const { loads } = (await (await engineer.context.request.get(`/api/marks/${mark.id}/loads`)).json()) as { loads: Array<{ id: string; name: string; Pu: number; version: number }> };
  const changed = loads[0];
  if (!changed) throw new Error("the copied mark has no loads");
  expect((await engineer.context.request.patch(`/api/marks/${mark.id}/loads/${changed.id}`, { data: { Pu: changed.Pu + 1, version: changed.version } })).status()).toBe(200);
  await g.goto(`${markUrl}/alternatives`);
  const adopted = g.getByRole("listitem", { name: `Alternative ${firstId}` });
  await expect(adopted.getByTestId("alternative-stale")).toBeVisible();
  await adopted.getByRole("button", { name: "Re-check with current inputs" }).click();
  await expect(adopted.getByRole("status")).toContainText("still passes");
  await expect(adopted.getByTestId("alternative-stale")).toHaveCount(0);

  // The column schedule shows the adopted design; the CSV and the calculation package download.
  await g.goto(`/w/${workspaceId}/projects/${project.id}`);
  await g.getByRole("navigation", { name: "Project screens" }).getByRole("link", { name: "Column schedule" }).click();
  const row = g.getByTestId("schedule-row").filter({ hasText: "B-3" });
  await expect(row).toContainText(firstId);
  await expect(row).toContainText("✓");
  await expect(g.getByTestId("totals-by-category")).toContainText("$");
  await expect(g.getByTestId("totals-by-level")).toContainText(source.mark.level ?? "");
  const [csvDownload] = await Promise.all([g.waitForEvent("download"), g.getByRole("link", { name: "Download CSV" }).click()]);
  const csv = await readFile((await csvDownload.path()) ?? "", "utf8");
  expect(csv).toContain(firstId);
  expect(csv.split(/\r?\n/)[0]).toContain("Mark");
  const [pdfDownload] = await Promise.all([
    g.waitForEvent("download", { timeout: 60_000 }),
    g.getByRole("link", { name: "Download calculation package (PDF)" }).click(),
  ]);
  const pdf = await readFile((await pdfDownload.path()) ?? "");
  expect(pdf.subarray(0, 5).toString("latin1")).toBe("%PDF-");
  expect(pdf.length).toBeGreaterThan(2000);

  await Promise.all([owner.context.close(), estimator.context.close(), engineer.context.close()]);
});
