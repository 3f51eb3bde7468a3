/**
 * Invented projects for tests and the benchmark (demo data only: no real building, no real
 * prices). Each mark gets a demand; the outlines whose invented capacity covers it pass, and
 * each passing outline gets a few candidates (f'c and bar variants, sometimes both orientations)
 * with ids in the optimizer's format, so the objects look like `optimize` front entries.
 */
import type { StandardizeCandidate, StandardizeInput, StandardizeMark } from "./types";

/** Front-entry-like candidate (the fields standardization reads, plus a few it carries along). */
export interface InventedCandidate extends StandardizeCandidate {
  fy: number;
  braceLevels: number;
  carbon: number;
}

/** mulberry32: a small deterministic PRNG returning [0, 1). */
export function createSeededRandom(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export interface InventOptions {
  seed: number;
  marks: number;
  /** distinct (rotation-free) outlines per mark */
  outlinesPerMark: number;
  /** candidates per outline (f'c / bar variants), default 2 */
  variants?: number;
  formSetCost?: number;
  maxOutlines?: number;
  /** number of levels the marks are spread over (0: no levels) */
  levels?: number;
  /** side lengths to draw from, in (default 12 … 36 step 2) */
  sizes?: number[];
  /** include circular outlines (default true) */
  circles?: boolean;
}

interface Shape {
  shape: "rect" | "circle";
  b: number;
  h: number;
  D: number;
  capacity: number;
  area: number;
  perimeter: number;
}

export function inventProject(o: InventOptions): StandardizeInput<InventedCandidate> {
  const rnd = createSeededRandom(o.seed);
  const sizes = o.sizes ?? Array.from({ length: 13 }, (_, i) => 12 + 2 * i);
  const shapes: Shape[] = [];
  for (const b of sizes) {
    for (const h of sizes) {
      if (h < b) continue;
      shapes.push({ shape: "rect", b, h, D: 0, capacity: b * h * (1 + 0.01 * (h - b)), area: b * h, perimeter: 2 * (b + h) });
    }
  }
  if (o.circles !== false) {
    for (const D of sizes) shapes.push({ shape: "circle", b: 0, h: 0, D, capacity: 0.785 * D * D * 1.1, area: 0.785 * D * D, perimeter: Math.PI * D });
  }
  const maxCap = Math.max(...shapes.map((s) => s.capacity));
  const fcs = [4, 5, 6, 8];
  const marks: StandardizeMark<InventedCandidate>[] = [];
  for (let m = 0; m < o.marks; m++) {
    const demand = maxCap * (0.15 + 0.45 * rnd());
    const passing = shapes.filter((s) => s.capacity >= demand).sort((a, b) => a.capacity - b.capacity);
    const pool = passing.slice(0, Math.min(passing.length, o.outlinesPerMark + 10));
    // shuffle (Fisher–Yates) and keep outlinesPerMark of them
    for (let i = pool.length - 1; i > 0; i--) {
      const j = Math.floor(rnd() * (i + 1));
      [pool[i], pool[j]] = [pool[j] as Shape, pool[i] as Shape];
    }
    const chosen = pool.slice(0, o.outlinesPerMark);
    const candidates: InventedCandidate[] = [];
    for (const s of chosen) {
      const variants = o.variants ?? 2;
      const fcPick = [...fcs].sort(() => rnd() - 0.5).slice(0, variants);
      fcPick.forEach((fc, v) => {
        const ratio = demand / s.capacity;
        const steel = 600 * Math.max(0.35, 1.6 * ratio - 0.6) * (1 - 0.06 * (fc - 4));
        const cost = Math.round((s.area * 1.9 * (1 + 0.05 * (fc - 4)) + s.perimeter * 4.5 + steel + rnd() * 40) * 100) / 100;
        const utilization = Math.round(Math.min(1, ratio * (0.9 + 0.1 * rnd())) * 1e4) / 1e4;
        const carbon = Math.round(s.area * 0.9 * (1 + 0.1 * (fc - 4)) + steel * 0.3);
        if (s.shape === "circle") {
          candidates.push({ id: `c${s.D}-f${fc}-y60-${6 + 2 * v}#8-t-b0`, shape: "circle", D: s.D, fc, fy: 60, cost, utilization, braceLevels: 0, carbon });
        } else {
          // rectangles sometimes come in the other orientation (h × b), as the search yields both
          const turn = s.b !== s.h && rnd() < 0.3;
          const [b, h] = turn ? [s.h, s.b] : [s.b, s.h];
          candidates.push({ id: `r${b}x${h}-f${fc}-y60-${8 + 4 * v}#8-p${3 + v}x${3 + v}-b0`, shape: "rect", b, h, fc, fy: 60, cost, utilization, braceLevels: 0, carbon });
        }
      });
    }
    const mark: StandardizeMark<InventedCandidate> = { id: `m${m + 1}`, label: `C${m + 1}`, quantity: 1 + Math.floor(rnd() * 8), candidates };
    if ((o.levels ?? 0) > 0) mark.level = `L${1 + (m % (o.levels ?? 1))}`;
    marks.push(mark);
  }
  return { marks, maxOutlines: o.maxOutlines ?? 3, formSetCost: o.formSetCost ?? 1500 };
}
