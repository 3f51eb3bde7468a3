/**
 * Checks a standardization input and reduces it to the small problem the solvers work on:
 * each mark keeps only its cheapest passing candidate per outline (per outline and f'c when one
 * f'c per level is required), since a costlier candidate of the same outline can never be in an
 * optimal assignment (swapping it for the cheaper one keeps every constraint and lowers the cost).
 * Money is handled in whole cents so that totals and comparisons are exact.
 */
import { formatOutlineKey, type OutlineParts } from "./outline-key";
import type { StandardizeCandidate, StandardizeInput } from "./types";

/** One kept candidate of a mark. */
export interface MarkOption<C extends StandardizeCandidate> {
  outline: number;
  fc: number;
  /** quantity × cost in cents (the mark's share of the objective) */
  cents: number;
  candidate: C;
}

export interface PreparedMark<C extends StandardizeCandidate> {
  index: number;
  id: string;
  label: string;
  level: string | null;
  /** index into `levels` when the f'c-per-level rule applies to this mark, else -1 */
  levelIndex: number;
  quantity: number;
  /** sorted by cents, then utilization, then id (the order every tie is broken in) */
  options: MarkOption<C>[];
  /** passing candidates before the reduction */
  passing: number;
}

export interface PreparedProject<C extends StandardizeCandidate> {
  marks: PreparedMark<C>[];
  outlines: OutlineParts[];
  levels: string[];
  /** mark indices per level */
  levelMarks: number[][];
  formSetCents: number;
  maxOutlines: number;
  oneFcPerLevel: boolean;
  /** marks with no passing candidate */
  emptyMarks: number[];
}

export function toCents(x: number): number {
  return Math.round(x * 100);
}

/** Order of kept candidates: cheaper, then lower utilization, then id (code-unit order). */
export function compareOptions<C extends StandardizeCandidate>(a: MarkOption<C>, b: MarkOption<C>): number {
  if (a.cents !== b.cents) return a.cents - b.cents;
  if (a.candidate.utilization !== b.candidate.utilization) return a.candidate.utilization - b.candidate.utilization;
  return a.candidate.id < b.candidate.id ? -1 : a.candidate.id > b.candidate.id ? 1 : 0;
}

function isPassing(c: StandardizeCandidate): boolean {
  return c.pass !== false && c.utilization <= 1;
}

/**
 * @throws RangeError on input no solver should see (no marks, duplicate ids, a quantity that is
 *   not a positive whole number, N < 1, a negative or non-finite cost)
 */
export function prepareProject<C extends StandardizeCandidate>(input: StandardizeInput<C>): PreparedProject<C> {
  const { marks, maxOutlines, formSetCost } = input;
  if (marks.length === 0) throw new RangeError("marks: a project needs at least one mark");
  if (!Number.isInteger(maxOutlines) || maxOutlines < 1) throw new RangeError("maxOutlines must be a whole number ≥ 1");
  if (!Number.isFinite(formSetCost) || formSetCost < 0) throw new RangeError("formSetCost must be a number ≥ 0");
  const oneFcPerLevel = input.oneFcPerLevel === true;
  const rotated = input.rotatedShareForms !== false;

  const outlineIndex = new Map<string, number>();
  const outlines: OutlineParts[] = [];
  const levels: string[] = [];
  const levelIndex = new Map<string, number>();
  const levelMarks: number[][] = [];
  const seenMarks = new Set<string>();
  const emptyMarks: number[] = [];

  const prepared = marks.map((m, index): PreparedMark<C> => {
    if (seenMarks.has(m.id)) throw new RangeError(`marks.${index}.id: mark id ${m.id} appears twice`);
    seenMarks.add(m.id);
    if (!Number.isInteger(m.quantity) || m.quantity < 1) {
      throw new RangeError(`marks.${index}.quantity must be a whole number ≥ 1`);
    }
    const level = m.level ?? null;
    let li = -1;
    if (oneFcPerLevel && level !== null) {
      li = levelIndex.get(level) ?? -1;
      if (li < 0) {
        li = levels.length;
        levels.push(level);
        levelIndex.set(level, li);
        levelMarks.push([]);
      }
      (levelMarks[li] as number[]).push(index);
    }
    const best = new Map<string, MarkOption<C>>();
    const seenCandidates = new Set<string>();
    let passing = 0;
    m.candidates.forEach((c, ci) => {
      if (seenCandidates.has(c.id)) throw new RangeError(`marks.${index}.candidates.${ci}.id: candidate id ${c.id} appears twice in mark ${m.id}`);
      seenCandidates.add(c.id);
      if (!Number.isFinite(c.cost) || c.cost < 0) throw new RangeError(`marks.${index}.candidates.${ci}.cost must be a number ≥ 0`);
      if (!Number.isFinite(c.utilization) || c.utilization < 0) throw new RangeError(`marks.${index}.candidates.${ci}.utilization must be a number ≥ 0`);
      if (!Number.isFinite(c.fc) || c.fc <= 0) throw new RangeError(`marks.${index}.candidates.${ci}.fc must be a positive number`);
      const parts = formatOutlineKey(c, rotated);
      if (!isPassing(c)) return;
      passing++;
      let oi = outlineIndex.get(parts.key);
      if (oi === undefined) {
        oi = outlines.length;
        outlines.push(parts);
        outlineIndex.set(parts.key, oi);
      }
      const option: MarkOption<C> = { outline: oi, fc: c.fc, cents: toCents(c.cost * m.quantity), candidate: c };
      const groupKey = li >= 0 ? `${parts.key}|${String(c.fc)}` : parts.key;
      const prev = best.get(groupKey);
      if (prev === undefined || compareOptions(option, prev) < 0) best.set(groupKey, option);
    });
    const options = [...best.values()].sort(compareOptions);
    if (options.length === 0) emptyMarks.push(index);
    return { index, id: m.id, label: m.label, level, levelIndex: li, quantity: m.quantity, options, passing };
  });

  return {
    marks: prepared,
    outlines,
    levels,
    levelMarks,
    formSetCents: toCents(formSetCost),
    maxOutlines,
    oneFcPerLevel,
    emptyMarks,
  };
}
