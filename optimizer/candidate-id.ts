/**
 * Candidate ids, exactly as the CLI contract spells them:
 *   rectangles `r{b}x{h}-f{fc}-y{fy}-{count}{size}-p{nb}x{nh}-b{braceLevels}`
 *   circles    `c{D}-f{fc}-y{fy}-{count}{size}-{t|s}-b{braceLevels}` (t tied, s spiral)
 * Numbers print in their shortest round-trip form (18, 4.5), so an id is stable
 * across runs and machines and doubles as the last tie-breaker of every ordering.
 */
import type { BarSize, Confinement } from "../engine/types";

export interface RectIdParts {
  shape: "rect";
  b: number;
  h: number;
  fc: number;
  fy: number;
  size: BarSize;
  nb: number;
  nh: number;
  braceLevels: number;
}

export interface CircleIdParts {
  shape: "circle";
  D: number;
  fc: number;
  fy: number;
  size: BarSize;
  n: number;
  confinement: Confinement;
  braceLevels: number;
}

/** Number of bars of a perimeter layout: 2·nb + 2·(nh − 2) (cli-contract.md `layout`). */
export function countPerimeterBars(nb: number, nh: number): number {
  return 2 * nb + 2 * (nh - 2);
}

function num(x: number): string {
  return String(x);
}

/** Builds the contract id of one candidate, e.g. `r18x22-f5-y60-8#8-p3x3-b0`. */
export function formatCandidateId(p: RectIdParts | CircleIdParts): string {
  if (p.shape === "rect") {
    const count = countPerimeterBars(p.nb, p.nh);
    return `r${num(p.b)}x${num(p.h)}-f${num(p.fc)}-y${num(p.fy)}-${count}${p.size}-p${p.nb}x${p.nh}-b${p.braceLevels}`;
  }
  const conf = p.confinement === "spiral" ? "s" : "t";
  return `c${num(p.D)}-f${num(p.fc)}-y${num(p.fy)}-${p.n}${p.size}-${conf}-b${p.braceLevels}`;
}

// {count}{size}: US sizes carry "#"; A615M designations are always two digits ("10"…"57"),
// so "625" reads as 6 bars of size 25 (the contract's id has no separator there).
const RECT_ID = /^r([0-9.]+)x([0-9.]+)-f([0-9.]+)-y([0-9.]+)-(\d+)(#\d+|\d\d)-p(\d+)x(\d+)-b(\d+)$/;
const CIRCLE_ID = /^c([0-9.]+)-f([0-9.]+)-y([0-9.]+)-(\d+)(#\d+|\d\d)-([ts])-b(\d+)$/;

/**
 * Reads an id back into its parts (the web app keeps ids of adopted alternatives).
 * Returns null for a string that is not a well-formed candidate id.
 */
export function parseCandidateId(id: string): RectIdParts | CircleIdParts | null {
  const r = RECT_ID.exec(id);
  if (r) {
    const [, b, h, fc, fy, count, size, nb, nh, br] = r;
    const parts: RectIdParts = {
      shape: "rect", b: Number(b), h: Number(h), fc: Number(fc), fy: Number(fy), size: size as BarSize,
      nb: Number(nb), nh: Number(nh), braceLevels: Number(br),
    };
    if (countPerimeterBars(parts.nb, parts.nh) !== Number(count)) return null;
    return parts;
  }
  const c = CIRCLE_ID.exec(id);
  if (c) {
    const [, D, fc, fy, n, size, conf, br] = c;
    return {
      shape: "circle", D: Number(D), fc: Number(fc), fy: Number(fy), size: size as BarSize, n: Number(n),
      confinement: conf === "s" ? "spiral" : "tied", braceLevels: Number(br),
    };
  }
  return null;
}
