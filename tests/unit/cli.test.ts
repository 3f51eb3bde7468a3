import { spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { command as checkCommand } from "@/lib/cli/check";
import { command as diagramCommand } from "@/lib/cli/diagram";
import { command as kCommand } from "@/lib/cli/k";
import { runCommand, type CliCommand, type CliIo } from "@/lib/cli/run-command";

const ROOT = path.resolve(import.meta.dirname, "../..");
const dir = mkdtempSync(path.join(tmpdir(), "caryatid-cli-"));

const REQUEST = {
  section: {
    shape: "rect", b: 18, h: 22, fc: 5, fy: 60, confinement: "tied", cover: 1.5,
    layout: { type: "perimeter", size: "#8", nb: 3, nh: 4 },
  },
  member: { lu: 204, kx: 1.0, ky: 1.0, braced: true, braceLevels: 0, transverseLoad: false },
  options: { ei: "b", dagg: 0.75 },
  loads: [{ name: "1.2D+1.6L", Pu: 310, betaDns: 0.55, Mx: { M1: 700, M2: 1450, curvature: "single" }, My: { M1: 0, M2: 0, curvature: "double" } }],
};
type Req = typeof REQUEST;
const clone = (): Req => JSON.parse(JSON.stringify(REQUEST)) as Req;

/** Run a command in-process with captured streams; `input` is what FILE / stdin holds. */
async function run(cmd: CliCommand, args: string[], input?: string) {
  let stdout = "";
  let stderr = "";
  const io: CliIo = {
    stdout: (t) => void (stdout += t),
    stderr: (t) => void (stderr += t),
    readInput: async () => {
      if (input === undefined) throw new Error("no such file");
      return input;
    },
  };
  const code = await runCommand(cmd, args, io);
  return { code, stdout, stderr };
}

async function invalid(body: unknown) {
  const r = await run(checkCommand, ["-"], typeof body === "string" ? body : JSON.stringify(body));
  expect(r.code).toBe(2);
  expect(r.stdout).toBe("");
  const err = JSON.parse(r.stderr) as { error: string; issues: { path: string; message: string }[] };
  expect(typeof err.error).toBe("string");
  expect(err.issues.length).toBeGreaterThan(0);
  return err;
}

describe("check command (in-process)", () => {
  it("passing design: exit 0 and the contract's fields", async () => {
    const r = await run(checkCommand, ["-"], JSON.stringify(REQUEST));
    expect(r.code).toBe(0);
    expect(r.stderr).toBe("");
    const out = JSON.parse(r.stdout) as Record<string, unknown>;
    for (const k of ["pass", "utilization", "governing", "section", "cases", "quantities", "reasons", "assumptions"]) expect(out).toHaveProperty(k);
    const c = (out.cases as Record<string, unknown>[])[0]!;
    for (const k of ["name", "Pu", "utilization", "pass", "reasons", "x", "y", "biaxial", "segment"]) expect(c).toHaveProperty(k);
    for (const k of ["klur", "limit", "slender", "EI", "Pc", "Cm", "delta", "M2", "Mc", "phiMn", "ratio"]) expect(c.x as object).toHaveProperty(k);
  });

  it("failing design: exit 1 with reasons", async () => {
    const req = clone();
    req.loads[0]!.Mx = { M1: 3000, M2: 6000, curvature: "single" };
    const r = await run(checkCommand, ["-"], JSON.stringify(req));
    expect(r.code).toBe(1);
    const out = JSON.parse(r.stdout) as { pass: boolean; reasons: string[] };
    expect(out.pass).toBe(false);
    expect(out.reasons.length).toBeGreaterThan(0);
  });

  it("negative size → section.b", async () => {
    const req = clone();
    req.section.b = -18;
    const e = await invalid(req);
    expect(e.issues).toContainEqual({ path: "section.b", message: "b must be > 0" });
  });

  it("unknown bar size → section.layout.size", async () => {
    const req = clone();
    (req.section.layout as { size: string }).size = "#12";
    const e = await invalid(req);
    expect(e.issues[0]!.path).toBe("section.layout.size");
    expect(e.issues[0]!.message).toMatch(/unknown bar size/);
  });

  it("M1 > M2 → loads.0.Mx.M1", async () => {
    const req = clone();
    req.loads[0]!.Mx = { M1: 2000, M2: 1450, curvature: "single" };
    const e = await invalid(req);
    expect(e.issues[0]!.path).toBe("loads.0.Mx.M1");
    expect(e.issues[0]!.message).toMatch(/exceeds M2/);
  });

  it("NaN: a NaN token is invalid JSON; a string \"NaN\" is not a number", async () => {
    const text = JSON.stringify(REQUEST).replace('"Pu":310', '"Pu":NaN');
    expect((await invalid(text)).error).toBe("invalid JSON");
    const req = clone() as unknown as { loads: { Pu: unknown }[] };
    req.loads[0]!.Pu = "NaN";
    const e = await invalid(req);
    expect(e.issues[0]).toEqual({ path: "loads.0.Pu", message: "Pu (kip or kN, compression positive) must be a finite number" });
  });

  it("missing fields are named", async () => {
    const req = clone() as Partial<Req>;
    delete req.member;
    const e = await invalid({ ...req, loads: [{ name: "x", betaDns: 0.5, Mx: { M1: 0, M2: 1, curvature: "single" } }] });
    const paths = e.issues.map((i) => i.path);
    expect(paths).toContain("member");
    expect(paths).toContain("loads.0.Pu");
  });

  it("bars outside the section (engine RangeError) → exit 2 with the bar's path", async () => {
    const req = clone() as unknown as { section: Record<string, unknown> };
    delete req.section.layout;
    req.section.bars = [{ x: 0, y: 10.9, size: "#8" }, { x: 0, y: -8, size: "#8" }];
    const e = await invalid(req);
    expect(e.issues[0]!.path).toBe("section.bars.0");
    expect(e.issues[0]!.message).toMatch(/outside/);
  });

  it("fy above 80 ksi is invalid (Table 20.2.2.4(a))", async () => {
    const req = clone();
    req.section.fy = 100;
    expect((await invalid(req)).issues).toContainEqual(expect.objectContaining({ path: "section.fy" }));
  });

  it("unknown fields are refused (typos do not pass silently)", async () => {
    const req = clone() as unknown as { member: Record<string, unknown> };
    req.member.kz = 1;
    expect((await invalid(req)).issues[0]!.path).toBe("member");
  });

  it("missing file → exit 2", async () => {
    const r = await run(checkCommand, ["nope.json"]);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
  });
});

describe("diagram and k commands (in-process)", () => {
  it("diagram: points ordered from pure compression to pure tension", async () => {
    const r = await run(diagramCommand, ["-"], JSON.stringify({ section: REQUEST.section, axis: "x", points: 20 }));
    expect(r.code).toBe(0);
    const d = JSON.parse(r.stdout) as { P0: number; phiPnMax: number; points: { Pn: number }[] };
    expect(d.points[0]!.Pn).toBeCloseTo(d.P0, 6);
    expect(d.points.at(-1)!.Pn).toBeLessThan(0);
  });

  it("k: braced and sway; bad ψ → exit 2", async () => {
    const b = await run(kCommand, ["--psi-a", "1", "--psi-b", "1"]);
    expect(b.code).toBe(0);
    expect((JSON.parse(b.stdout) as { k: number }).k).toBeCloseTo(0.774, 2);
    const s = await run(kCommand, ["--psi-a=1", "--psi-b=1", "--sway"]);
    expect((JSON.parse(s.stdout) as { k: number; sway: boolean }).sway).toBe(true);
    const bad = await run(kCommand, ["--psi-a", "-2", "--psi-b", "1"]);
    expect(bad.code).toBe(2);
    expect(bad.stdout).toBe("");
    expect(JSON.parse(bad.stderr).issues[0].path).toBe("psiA");
    expect((await run(kCommand, ["--psi-b", "1"])).code).toBe(2);
  });
});

describe("scripts/cli.ts (spawned)", () => {
  const cli = (args: string[], input?: string) =>
    spawnSync("npx", ["tsx", "scripts/cli.ts", ...args], { cwd: ROOT, input, encoding: "utf8", timeout: 60_000 });

  it("check FILE: exit 0 and JSON on stdout", () => {
    const f = path.join(dir, "ok.json");
    writeFileSync(f, JSON.stringify(REQUEST));
    const r = cli(["check", f]);
    expect(r.status).toBe(0);
    expect((JSON.parse(r.stdout) as { pass: boolean }).pass).toBe(true);
  });

  it("check -: invalid input exits 2 with empty stdout and the error JSON on stderr", () => {
    const req = clone();
    req.section.b = -1;
    const r = cli(["check", "-"], JSON.stringify(req));
    expect(r.status).toBe(2);
    expect(r.stdout).toBe("");
    expect(JSON.parse(r.stderr)).toMatchObject({ error: "invalid check request", issues: [{ path: "section.b" }] });
  });

  it("check -: a failing design exits 1", () => {
    const req = clone();
    req.loads[0]!.Pu = 5000;
    expect(cli(["check", "-"], JSON.stringify(req)).status).toBe(1);
  });

  it("SI round trip: output in kN, mm, kN·m with the US utilization", () => {
    const si = {
      units: "SI",
      section: { shape: "rect", b: 457.2, h: 558.8, fc: 34.473786, fy: 413.685438, confinement: "tied", cover: 38.1, layout: { type: "perimeter", size: "#8", nb: 3, nh: 4 } },
      member: { lu: 5181.6, kx: 1, ky: 1, braced: true },
      options: { ei: "b", dagg: 19.05 },
      loads: [{ name: "1.2D+1.6L", Pu: 310 * 4.4482216152605, betaDns: 0.55, Mx: { M1: 700 * 0.112984829, M2: 1450 * 0.112984829, curvature: "single" } }],
    };
    const us = cli(["check", "-"], JSON.stringify({ ...REQUEST, loads: [{ ...REQUEST.loads[0], My: undefined }] }));
    const r = cli(["check", "-"], JSON.stringify(si));
    expect(r.status).toBe(0);
    const a = JSON.parse(us.stdout) as { utilization: number; cases: { x: { Mc: number }; Pu: number }[]; section: { Ag: number } };
    const b = JSON.parse(r.stdout) as typeof a & { assumptions: { units: string } };
    expect(b.utilization).toBeCloseTo(a.utilization, 5);
    expect(b.cases[0]!.Pu).toBeCloseTo(310 * 4.4482216152605, 6);
    expect(b.cases[0]!.x.Mc).toBeCloseTo(a.cases[0]!.x.Mc * 0.112984829, 3);
    expect(b.section.Ag).toBeCloseTo(457.2 * 558.8, 3);
    expect(b.assumptions.units).toBe("SI");
  });

  it("k via npm script form and an unknown command → exit 2", () => {
    const r = cli(["k", "--psi-a", "0", "--psi-b", "0", "--sway"]);
    expect(r.status).toBe(0);
    expect((JSON.parse(r.stdout) as { k: number }).k).toBe(1);
    const u = cli(["frobnicate"]);
    expect(u.status).toBe(2);
    expect(u.stdout).toBe("");
  });
});
