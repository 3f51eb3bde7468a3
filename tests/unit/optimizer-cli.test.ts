/**
 * `optimize FILE|-` through the CLI runner: the contract's exit codes (0 something passes,
 * 1 nothing passes, 2 invalid input with the error body on stderr and nothing on stdout).
 */
import { describe, expect, it } from "vitest";
import { command } from "../../lib/cli/optimize";
import { runCommand, type CliIo } from "../../lib/cli/run-command";
import { bracingLosesRequest, infeasibleRequest } from "./optimizer-fixtures";

function io(input: string) {
  const out: string[] = [];
  const err: string[] = [];
  const stream: CliIo = { stdout: (t) => void out.push(t), stderr: (t) => void err.push(t), readInput: async () => input };
  return { stream, out, err };
}

async function run(input: unknown) {
  const x = io(typeof input === "string" ? input : JSON.stringify(input));
  const code = await runCommand(command, ["-"], x.stream);
  return { code, stdout: x.out.join(""), stderr: x.err.join("") };
}

describe("optimize on the command line", () => {
  it("prints best, fronts and stats and exits 0 when something passes", async () => {
    const r = await run({ ...bracingLosesRequest, threads: 2 });
    expect(r.code).toBe(0);
    expect(r.stderr).toBe("");
    const out = JSON.parse(r.stdout);
    expect(Object.keys(out)).toEqual(["best", "front", "carbonFront", "stats", "rejected", "assumptions"]);
    expect(Object.keys(out.stats)).toEqual(["candidates", "fullChecks", "passing", "ms", "threads"]);
    expect(out.stats.threads).toBe(2);
    expect(out.best.id).toBe(out.front[0].id);
    expect(Object.keys(out.best)).toEqual(
      expect.arrayContaining(["id", "shape", "b", "h", "fc", "fy", "bars", "braceLevels", "cost", "carbon", "costBreakdown", "quantities", "utilization", "governing"]),
    );
    expect(out.best.id).toMatch(/^r\d+x\d+-f\d+-y60-\d+#\d+-p\d+x\d+-b0$/);
    expect(out.assumptions.code).toBe("ACI 318-19");
  }, 60_000);

  it("exits 1 with reasons when nothing passes", async () => {
    const r = await run({ ...infeasibleRequest, threads: 1 });
    expect(r.code).toBe(1);
    const out = JSON.parse(r.stdout);
    expect(out.best).toBeNull();
    expect(out.front).toEqual([]);
    expect(out.rejected.length).toBe(2);
  }, 60_000);

  const bad: Array<[string, unknown, string]> = [
    ["fy above 80 ksi", { ...bracingLosesRequest, space: { ...bracingLosesRequest.space, fy: [90] } }, "space.fy.0"],
    ["an f'c without a price", { ...bracingLosesRequest, space: { ...bracingLosesRequest.space, fc: [5, 7] } }, "prices.concrete.7"],
    ["M1 above M2", { ...bracingLosesRequest, loads: [{ name: "a", Pu: 100, betaDns: 0.5, Mx: { M1: 900, M2: 100, curvature: "single" } }] }, "loads.0.Mx.M1"],
    ["brace levels on the member", { ...bracingLosesRequest, member: { ...bracingLosesRequest.member, braceLevels: 1 } }, "member.braceLevels"],
    ["a range running backwards", { ...bracingLosesRequest, space: { ...bracingLosesRequest.space, b: [30, 12, 2] } }, "space.b"],
    ["an unknown field", { ...bracingLosesRequest, colour: "red" }, ""],
    ["rhoMax above 0.08", { ...bracingLosesRequest, space: { ...bracingLosesRequest.space, rhoMax: 0.1 } }, "space.rhoMax"],
  ];
  for (const [label, request, path] of bad) {
    it(`rejects ${label} with the contract's error body (exit 2, stdout empty)`, async () => {
      const r = await run(request);
      expect(r.code).toBe(2);
      expect(r.stdout).toBe("");
      const body = JSON.parse(r.stderr);
      expect(body.error).toBe("invalid optimize request");
      expect(Array.isArray(body.issues)).toBe(true);
      expect(body.issues.map((i: { path: string }) => i.path)).toContain(path);
      for (const i of body.issues) expect(typeof i.message).toBe("string");
    });
  }

  it("rejects text that is not JSON", async () => {
    const r = await run("{ not json");
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    expect(JSON.parse(r.stderr).error).toBe("invalid JSON");
  });
});
