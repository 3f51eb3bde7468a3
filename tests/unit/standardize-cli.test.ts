/**
 * `standardize` from the command line: the real dispatcher spawned with JSON on stdin, exit codes
 * 0 (an assignment), 1 (none exists), 2 (invalid input: error JSON on stderr, empty stdout), and the
 * request schema's path-named issues in-process.
 */
import { spawnSync } from "node:child_process";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { command } from "@/lib/cli/standardize";
import { runCommand, type CliIo } from "@/lib/cli/run-command";

const ROOT = path.resolve(import.meta.dirname, "../..");

const cli = (input: string) => spawnSync("npx", ["tsx", "scripts/cli.ts", "standardize", "-"], { cwd: ROOT, input, encoding: "utf8", timeout: 60_000 });

const rect = (id: string, b: number, h: number, fc: number, cost: number, utilization = 0.9) => ({ id, shape: "rect", b, h, fc, cost, utilization });

/** Two marks: on one outline (18×22, rotated for C2) 3 × 1180.50 + 2 × 1250 + one 500 form set. */
const REQUEST = {
  maxOutlines: 1,
  formSetCost: 500,
  marks: [
    {
      id: "C1", quantity: 3, level: "L2",
      candidates: [rect("r18x22-f5-y60-8#8-p3x3-b0", 18, 22, 5, 1180.5, 0.97), { id: "c20-f5-y60-8#8-t-b0", shape: "circle", D: 20, fc: 5, cost: 1100, utilization: 0.91, governing: "1.2D+1.6L" }],
    },
    { id: "C2", label: "C2 (stair core)", quantity: 2, level: "L2", candidates: [rect("r22x18-f5-y60-10#8-p4x3-b0", 22, 18, 5, 1250, 0.88)] },
  ],
};

async function runInProcess(body: unknown) {
  let stdout = "";
  let stderr = "";
  const io: CliIo = { stdout: (t) => void (stdout += t), stderr: (t) => void (stderr += t), readInput: async () => JSON.stringify(body) };
  const code = await runCommand(command, ["-"], io);
  return { code, stdout, stderr, issues: stderr === "" ? [] : (JSON.parse(stderr) as { issues: Array<{ path: string; message: string }> }).issues };
}

describe("standardize CLI (spawned)", () => {
  it("exit 0 with the assignment on stdout", () => {
    const r = cli(JSON.stringify(REQUEST));
    expect(r.stderr).toBe("");
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout) as { feasible: boolean; totalCost: number; outlines: Array<{ key: string }>; assignment: Array<{ candidateId: string; candidate: Record<string, unknown> }> };
    expect(out.feasible).toBe(true);
    // 3 × 1180.50 + 2 × 1250 + 500 (the circle would need a second form set)
    expect(out.totalCost).toBe(6541.5);
    expect(out.outlines.map((o) => o.key)).toEqual(["r18x22"]);
    expect(out.assignment.map((a) => a.candidateId)).toEqual(["r18x22-f5-y60-8#8-p3x3-b0", "r22x18-f5-y60-10#8-p4x3-b0"]);
  });

  it("exit 1 when a mark has no passing candidate, naming it", () => {
    const req = structuredClone(REQUEST);
    (req.marks[1] as { candidates: unknown[] }).candidates = [rect("r22x18-f5-y60-10#8-p4x3-b0", 22, 18, 5, 1250, 1.04)];
    const r = cli(JSON.stringify(req));
    expect(r.status).toBe(1);
    const out = JSON.parse(r.stdout) as { feasible: boolean; reasons: string[] };
    expect(out.feasible).toBe(false);
    expect(out.reasons).toEqual(["mark C2 (stair core) (id C2) has no passing candidate (1 given, none with utilization ≤ 1)"]);
  });

  it("exit 2 on invalid input: error JSON on stderr, nothing on stdout", () => {
    const req = structuredClone(REQUEST) as { marks: Array<{ quantity: number }> };
    (req.marks[0] as { quantity: number }).quantity = 0;
    const r = cli(JSON.stringify(req));
    expect(r.status).toBe(2);
    expect(r.stdout).toBe("");
    const err = JSON.parse(r.stderr) as { error: string; issues: Array<{ path: string; message: string }> };
    expect(err.error).toBe("invalid standardize request");
    expect(err.issues).toEqual([{ path: "marks.0.quantity", message: "quantity must be ≥ 1" }]);
  });
});

describe("standardize request (in-process)", () => {
  it("sweep: one result per N, exit 0", async () => {
    const { maxOutlines: _n, ...rest } = REQUEST;
    const r = await runInProcess({ ...rest, sweep: true });
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as { sweep: Array<{ maxOutlines: number; totalCost: number }> };
    expect(out.sweep.map((s) => s.maxOutlines)).toEqual([1, 2]);
    // N = 2: C1 takes its circle (1100) at the price of a second form set: 3300 + 2500 + 1000 = 6800 > 6541.50
    expect(out.sweep.map((s) => s.totalCost)).toEqual([6541.5, 6541.5]);
  });

  it("names the path of every problem", async () => {
    const bad = {
      formSetCost: -5,
      oneFcPerLevel: "yes",
      marks: [
        { id: "A", quantity: 1.5, candidates: [{ id: "x", shape: "rect", b: 12, fc: 5, cost: 10, utilization: 0.5 }, { id: "x", shape: "circle", D: 12, fc: 5, cost: 10, utilization: 0.5 }] },
        { id: "A", quantity: 1, candidates: [{ id: "y", shape: "hexagon", fc: 5, cost: 10, utilization: 0.5 }] },
      ],
    };
    const r = await runInProcess(bad);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    const paths = r.issues.map((i) => i.path).sort();
    expect(paths).toEqual(["formSetCost", "marks.0.candidates.0.h", "marks.0.quantity", "marks.1.candidates.0.shape", "oneFcPerLevel"].sort());
  });

  it("duplicate ids and a missing N are reported once the shapes are right", async () => {
    const { maxOutlines: _n, ...rest } = REQUEST;
    const req = structuredClone(rest);
    (req.marks[1] as { id: string }).id = "C1";
    const r = await runInProcess(req);
    expect(r.code).toBe(2);
    expect(r.issues.map((i) => i.path).sort()).toEqual(["marks.1.id", "maxOutlines"]);
  });
});
