/** Shared steps for the project and check end-to-end tests: sign in as the demo engineer and set up a fresh project. */
import { expect, type Page } from "@playwright/test";

export const ENGINEER = { email: "engineer@lindqvist-oduya.test", password: "engineer-demo-2026" };

export async function signInAsEngineer(page: Page): Promise<string> {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail", { exact: true }).fill(ENGINEER.email);
  await page.getByLabel("Password", { exact: true }).fill(ENGINEER.password);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
  await page.waitForURL(/\/w(\/|$)/);
  const res = await page.request.get("/api/workspaces");
  expect(res.status()).toBe(200);
  const body = (await res.json()) as { workspaces: Array<{ id: string; name: string }> };
  const ws = body.workspaces.find((w) => w.name === "Lindqvist Oduya Structural") ?? body.workspaces[0];
  if (!ws) throw new Error("the demo engineer has no workspace");
  return ws.id;
}

export async function createProjectWithMark(page: Page, workspaceId: string, name: string, mark: Record<string, unknown>) {
  const p = await page.request.post("/api/projects", { data: { workspaceId, name } });
  expect(p.status()).toBe(201);
  const project = ((await p.json()) as { project: { id: string } }).project;
  const m = await page.request.post(`/api/projects/${project.id}/marks`, { data: mark });
  expect(m.status(), await m.text()).toBe(201);
  const created = ((await m.json()) as { mark: { id: string } }).mark;
  return { projectId: project.id, markId: created.id, base: `/w/${workspaceId}/projects/${project.id}` };
}

export function uniqueName(prefix: string): string {
  return `${prefix} ${Date.now().toString(36)}${Math.random().toString(36).slice(2, 5)}`;
}
