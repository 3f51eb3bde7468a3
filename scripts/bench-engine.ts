/**
 * Engine benchmark: median time of one φMn(Pu) evaluation and of one full member check
 * (10 load cases, uniaxial and biaxial) for a 12-bar rectangular and a 10-bar circular
 * section. Prints figures in µs. Run: npm run bench:engine
 */
import {
  caseUtilization,
  checkResolved,
  circleCapacityAt,
  phiMnAt,
  phiMnAtAngle,
  prepareMember,
  resolveSection,
  type LoadCase,
  type MemberInput,
  type ResolvedSection,
} from "../engine";

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] as number;
}

/**
 * Median (and minimum) over `rounds` of the mean time per call within a batch of `batch`
 * calls, µs. The minimum is the figure least disturbed by other load on the machine.
 */
function time(fn: (i: number) => unknown, batch: number, rounds = 31): { median: number; min: number } {
  let sink = 0;
  for (let i = 0; i < batch * 3; i++) sink += fn(i) === null ? 1 : 0; // warm-up
  const samples: number[] = [];
  for (let r = 0; r < rounds; r++) {
    const t0 = process.hrtime.bigint();
    for (let i = 0; i < batch; i++) sink += fn(i) === null ? 1 : 0;
    samples.push(Number(process.hrtime.bigint() - t0) / 1000 / batch);
  }
  if (sink < 0) console.log(sink);
  return { median: median(samples), min: Math.min(...samples) };
}

const rect = resolveSection({
  shape: "rect", b: 20, h: 24, fc: 5, fy: 60, confinement: "tied", cover: 1.5,
  layout: { type: "perimeter", size: "#9", nb: 4, nh: 4 }, // 12 bars
});
const circ = resolveSection({
  shape: "circle", D: 24, fc: 5, fy: 60, confinement: "tied", cover: 1.5,
  layout: { type: "circle", size: "#8", n: 10 },
});

// Both axes slender: M2,min about y (§7.1) then makes every case biaxial.
const member: MemberInput = { lu: 216, kx: 1, ky: 1, braced: true, braceLevels: 0 };
// Weak axis braced short (luy): y is not slender, no M2,min about y, so the uniaxial
// cases stay uniaxial (column-checks.md §7.1).
const memberUni: MemberInput = { lu: 216, luy: 100, kx: 1, ky: 1, braced: true, braceLevels: 0 };

function loads(biaxial: boolean): LoadCase[] {
  const out: LoadCase[] = [];
  for (let i = 0; i < 10; i++) {
    const Pu = 150 + 45 * i;
    out.push({
      name: `C${i + 1}`,
      Pu,
      betaDns: 0.5,
      Mx: { M1: 300 + 20 * i, M2: 900 + 60 * i, curvature: i % 2 === 0 ? "single" : "double" },
      My: biaxial ? { M1: 150 + 10 * i, M2: 500 + 30 * i, curvature: "single" } : { M1: 0, M2: 0, curvature: "double" },
    });
  }
  return out;
}

const uni = loads(false);
const bi = loads(true);
const row = (label: string, t: { median: number; min: number }) =>
  console.log(`${label.padEnd(66)} median ${t.median.toFixed(2).padStart(8)} µs   min ${t.min.toFixed(2).padStart(8)} µs`);

function bench(name: string, s: ResolvedSection): void {
  const pus = [150, 300, 450, 600, 750];
  row(`${name}: phiMnAt (one axis, one Pu)`, time((i) => phiMnAt(s, "x", (pus[i % 5] as number) + (i % 7) * 1e-3), 2000));
  if (s.shape === "circle") row(`${name}: circleCapacityAt (one Pu)`, time((i) => circleCapacityAt(s, (pus[i % 5] as number) + (i % 7) * 1e-3), 1000));
  else row(`${name}: phiMnAtAngle (one direction, one Pu)`, time((i) => phiMnAtAngle(s, (pus[i % 5] as number) + (i % 7) * 1e-3, 0.3 + (i % 11) * 0.05), 500));
  row(`${name}: checkResolved, 10 cases, uniaxial (y not slender)`, time(() => checkResolved(s, memberUni, uni), 200));
  row(`${name}: checkResolved, 10 cases, My = 0 but y slender (M2,min)`, time(() => checkResolved(s, member, uni), 100));
  row(`${name}: checkResolved, 10 cases, biaxial`, time(() => checkResolved(s, member, bi), 100));
  const prep = prepareMember(s, member);
  const prepUni = prepareMember(s, memberUni);
  row(`${name}: caseUtilization × 10, uniaxial (no output)`, time(() => { let m = 0; for (const l of uni) m = Math.max(m, caseUtilization(prepUni, l)); return m; }, 200));
  row(`${name}: caseUtilization × 10, biaxial (no output)`, time(() => { let m = 0; for (const l of bi) m = Math.max(m, caseUtilization(prep, l)); return m; }, 100));
}

/**
 * A fixed arithmetic loop (the shape of the section kernel's bar loop), ns per pass: how fast
 * this shared machine runs right now. Figures above scale with it; compare runs by it.
 */
function machineSpeed(): number {
  const d = [1.1, 2.3, 3.7, 5.2, 7.9, 9.4, 11.6, 13.1, 15.8, 17.2, 19.9, 21.4];
  const t = time((i) => {
    const inv = 1 / (5 + (i % 7) * 0.1);
    let p = 0;
    for (let j = 0; j < 12; j++) p += Math.max(-60, Math.min(60, 87 * (1 - (d[j] as number) * inv))) * (d[j] as number);
    return p;
  }, 20000);
  return t.min * 1000;
}

const os = await import("node:os");
const speedBefore = machineSpeed();
console.log(`engine benchmark — node ${process.version}, 31 batches per figure (median and minimum of the batch means)`);
console.log(`machine now: reference loop ${speedBefore.toFixed(1)} ns (about 35 ns when this machine is quiet), load average ${os.loadavg().map((x) => x.toFixed(1)).join(" ")}`);
bench("rect 20×24, 12 #9", rect);
bench("circle D24, 10 #8", circ);
console.log(`machine after: reference loop ${machineSpeed().toFixed(1)} ns`);
