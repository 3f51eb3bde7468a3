/**
 * The outline (shape and size) of a candidate: what one form set makes.
 * Rectangles `r{b}x{h}`, circles `c{D}`, numbers in their shortest round-trip form as in
 * candidate ids (optimizer/candidate-id.ts), so `r18x22-f5-…` has outline `r18x22`.
 */
import type { StandardizeCandidate } from "./types";

export interface OutlineParts {
  key: string;
  shape: "rect" | "circle";
  b?: number;
  h?: number;
  D?: number;
}

function positiveDimension(v: number | undefined, what: string, id: string): number {
  if (typeof v !== "number" || !Number.isFinite(v) || v <= 0) {
    throw new RangeError(`candidate ${id}: ${what} must be a positive number`);
  }
  return v;
}

/**
 * Outline of one candidate. With `rotatedShareForms` (the default) a b×h rectangle and its h×b
 * turn are one outline, keyed smaller side first (`r18x22` for both 18×22 and 22×18).
 *
 * @example formatOutlineKey({ id: "x", shape: "rect", b: 22, h: 18, fc: 5, cost: 1, utilization: 0.9 }) // { key: "r18x22", b: 18, h: 22, … }
 * @throws RangeError when the dimensions of the shape are missing or not positive
 */
export function formatOutlineKey(c: StandardizeCandidate, rotatedShareForms = true): OutlineParts {
  if (c.shape === "circle") {
    const D = positiveDimension(c.D, "D", c.id);
    return { key: `c${String(D)}`, shape: "circle", D };
  }
  if (c.shape === "rect") {
    let b = positiveDimension(c.b, "b", c.id);
    let h = positiveDimension(c.h, "h", c.id);
    if (rotatedShareForms && b > h) [b, h] = [h, b];
    return { key: `r${String(b)}x${String(h)}`, shape: "rect", b, h };
  }
  throw new RangeError(`candidate ${String((c as { id?: unknown }).id)}: shape must be "rect" or "circle"`);
}
