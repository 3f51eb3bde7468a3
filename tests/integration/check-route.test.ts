/**
 * POST /api/check and POST /api/diagram (signed-in users; the session is checked against the
 * database, hence this lives with the integration tests) answer exactly what the CLI prints for the same JSON
 * (cli-contract.md): the route handler is run in-process, the CLI as a separate process
 * (`tsx scripts/cli.ts check -`), and their outputs compared byte for byte, with the exit code
 * carried in a header. Invalid input gives the contract's error body (400 ≙ exit 2).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeDb } from "./support/database";
import { createTestUser, type TestUser } from "./support/fixtures";
import { spawnSync } from "node:child_process";
import path from "node:path";
import { buildRequest, callRoute } from "./support/session";
import * as checkRoute from "@/app/api/check/route";
import * as diagramRoute from "@/app/api/diagram/route";

const ROOT = path.resolve(import.meta.dirname, "../..");
// A real user: the session helper also checks that the signed-in person still exists.
let user: TestUser;
beforeAll(async () => {
  user = await createTestUser("checker");
});
afterAll(closeDb);

function runCli(command: string, input: unknown): { stdout: string; stderr: string; status: number | null } {
  const r = spawnSync(process.execPath, [path.join(ROOT, "node_modules/tsx/dist/cli.mjs"), path.join(ROOT, "scripts/cli.ts"), command, "-"], {
    input: JSON.stringify(input),
    encoding: "utf8",
    cwd: ROOT,
  });
  return { stdout: r.stdout, stderr: r.stderr, status: r.status };
}

/** The route's raw response text and exit-code header (no re-serialisation in between). */
async function postRaw(route: typeof checkRoute.POST, url: string, input: unknown) {
  const req = await buildRequest(url, { method: "POST", user, body: input });
  const res = await route(req, { params: Promise.resolve({}) });
  return { status: res.status, text: await res.text(), exit: res.headers.get("x-caryatid-exit-code") };
}

// An invented tall column: 16 × 16 in, 8 #8, ℓu = 20 ft, single curvature (demo-style input).
const slender = {
  section: { shape: "rect", b: 16, h: 16, fc: 5, fy: 60, confinement: "tied", cover: 1.5, layout: { type: "perimeter", size: "#8", nb: 3, nh: 3 } },
  member: { lu: 240, kx: 1, ky: 1, braced: true },
  options: { ei: "b", dagg: 0.75 },
  loads: [
    { name: "1.2D+1.6L", Pu: 420, betaDns: 0.6, Mx: { M1: 600, M2: 1100, curvature: "single" }, My: { M1: 0, M2: 150, curvature: "double" } },
    { name: "1.4D", Pu: 380, betaDns: 1, Mx: { M1: 300, M2: 500, curvature: "single" } },
  ],
};
const stocky = { ...slender, member: { lu: 96, kx: 1, ky: 1, braced: true }, loads: [{ name: "1.4D", Pu: 150, betaDns: 1, Mx: { M1: 100, M2: 200, curvature: "double" } }] };

describe("POST /api/check", () => {
  it.each([
    ["a design the CLI fails (exit 1)", slender],
    ["a design the CLI passes (exit 0)", stocky],
  ])("returns byte for byte the CLI's output for %s", async (_label, input) => {
    const cli = runCli("check", input);
    const res = await postRaw(checkRoute.POST, "/api/check", input);
    expect(res.status).toBe(200);
    expect(res.text).toBe(cli.stdout);
    expect(res.exit).toBe(String(cli.status));
  });

  it("the two cases really differ: one passes, one fails (so the test above can fail)", () => {
    expect(runCli("check", slender).status).toBe(1);
    expect(runCli("check", stocky).status).toBe(0);
  });

  it("answers invalid input with 400 and the CLI's error body (exit 2)", async () => {
    const bad = { ...slender, loads: [{ ...slender.loads[0], Pu: "heavy" }] };
    const cli = runCli("check", bad);
    expect(cli.status).toBe(2);
    expect(cli.stdout).toBe("");
    const res = await callRoute(checkRoute.POST, "/api/check", { method: "POST", user, body: bad });
    expect(res.status).toBe(400);
    expect(res.json).toEqual(JSON.parse(cli.stderr));
    expect((res.json as { issues: Array<{ path: string }> }).issues[0]?.path).toBe("loads.0.Pu");
  });

  it("needs a signed-in user (401)", async () => {
    const res = await callRoute(checkRoute.POST, "/api/check", { method: "POST", body: stocky });
    expect(res.status).toBe(401);
  });
});

describe("POST /api/diagram", () => {
  it("returns the CLI's diagram for the same section", async () => {
    const input = { section: slender.section, axis: "y", points: 24 };
    const cli = runCli("diagram", input);
    const res = await postRaw(diagramRoute.POST, "/api/diagram", input);
    expect(res.status).toBe(200);
    expect(res.text).toBe(cli.stdout);
  });
});
