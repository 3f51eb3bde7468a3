/**
 * Shared bodies for the projects / marks / loads integration tests. The numbers are invented
 * test inputs (no outside values are checked against them here).
 */
import { callRoute } from "./support/session";
import type { TestUser } from "./support/fixtures";
import * as projectsRoute from "@/app/api/projects/route";
import * as marksRoute from "@/app/api/projects/[projectId]/marks/route";
import * as loadsRoute from "@/app/api/marks/[markId]/loads/route";

export const sectionBody = {
  shape: "rect",
  b: 16,
  h: 16,
  fc: 5,
  fy: 60,
  confinement: "tied",
  cover: 1.5,
  layout: { type: "perimeter", size: "#8", nb: 3, nh: 3 },
} as const;

export function markBody(label = "C-1", level = "L2") {
  return {
    label,
    level,
    quantity: 4,
    member: { lu: 240, kx: 1, ky: 1, braced: true },
    limits: { maxB: 24, note: "architect: 24 in max" },
    design: { section: sectionBody, braceLevels: 0 },
  };
}

export function loadBody(name = "1.2D+1.6L", Pu = 300) {
  return { name, Pu, betaDns: 0.6, Mx: { M1: 400, M2: 800, curvature: "single" }, My: { M1: 0, M2: 100, curvature: "double" } };
}

export async function createProjectAs(user: TestUser, workspaceId: string, name = "Harbour Lofts") {
  const res = await callRoute<{ project: { id: string; version: number } }>(projectsRoute.POST, "/api/projects", {
    method: "POST",
    user,
    body: { workspaceId, name },
  });
  if (res.status !== 201) throw new Error(`project create failed: ${res.status} ${JSON.stringify(res.json)}`);
  return res.json.project;
}

export async function createMarkAs(user: TestUser, projectId: string, body: unknown = markBody()) {
  const res = await callRoute<{ mark: { id: string; version: number } }>(marksRoute.POST, `/api/projects/${projectId}/marks`, {
    method: "POST",
    user,
    body,
    params: { projectId },
  });
  if (res.status !== 201) throw new Error(`mark create failed: ${res.status} ${JSON.stringify(res.json)}`);
  return res.json.mark;
}

export async function createLoadAs(user: TestUser, markId: string, body: unknown = loadBody()) {
  const res = await callRoute<{ load: { id: string; version: number } }>(loadsRoute.POST, `/api/marks/${markId}/loads`, {
    method: "POST",
    user,
    body,
    params: { markId },
  });
  if (res.status !== 201) throw new Error(`load create failed: ${res.status} ${JSON.stringify(res.json)}`);
  return res.json.load;
}
