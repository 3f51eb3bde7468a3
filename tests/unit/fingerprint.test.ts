import { describe, expect, it } from "vitest";
import { fingerprintInputs, stableStringify } from "@/lib/fingerprint";
import { toStoredCandidates, MAX_STORED_CANDIDATES } from "@/lib/jobs/process-search-job";

describe("stableStringify / fingerprintInputs", () => {
  it("does not depend on key order, and ignores undefined fields", () => {
    expect(stableStringify({ b: 1, a: { d: [1, 2], c: null } })).toBe(stableStringify({ a: { c: null, d: [1, 2] }, b: 1, e: undefined }));
    expect(fingerprintInputs({ x: 1, y: 2 })).toBe(fingerprintInputs({ y: 2, x: 1 }));
  });

  it("changes when any value changes, including array order", () => {
    const base = { loads: [{ Pu: 300 }, { Pu: 250 }] };
    expect(fingerprintInputs(base)).not.toBe(fingerprintInputs({ loads: [{ Pu: 300.5 }, { Pu: 250 }] }));
    expect(fingerprintInputs(base)).not.toBe(fingerprintInputs({ loads: [{ Pu: 250 }, { Pu: 300 }] }));
  });

  it("handles empty and primitive inputs", () => {
    expect(stableStringify({})).toBe("{}");
    expect(stableStringify([])).toBe("[]");
    expect(stableStringify(null)).toBe("null");
    expect(fingerprintInputs("")).toHaveLength(64);
  });
});

describe("toStoredCandidates", () => {
  const entry = (id: string, cost: number, utilization: number) => ({ id, shape: "rect", cost, carbon: cost / 10, utilization });

  it("keeps every front member flagged, adds passing ones once, never duplicates", () => {
    const front = [entry("a", 100, 0.9), entry("b", 120, 0.7)];
    const passing = [entry("a", 100, 0.9), entry("c", 130, 0.95), entry("b", 120, 0.7)];
    const rows = toStoredCandidates({ front, passing, stats: {} });
    expect(rows.map((r) => [r.candidateId, r.onFront])).toEqual([["a", true], ["b", true], ["c", false]]);
  });

  it("caps the non-front rows but always stores the whole front", () => {
    const front = [entry("front-1", 1, 0.5)];
    const passing = Array.from({ length: MAX_STORED_CANDIDATES + 50 }, (_, i) => entry(`p-${i}`, 10 + i, 0.9));
    const rows = toStoredCandidates({ front, passing, stats: {} });
    expect(rows).toHaveLength(MAX_STORED_CANDIDATES);
    expect(rows.filter((r) => r.onFront)).toHaveLength(1);
  });

  it("stores nothing for an empty result", () => {
    expect(toStoredCandidates({ front: [], stats: {} })).toEqual([]);
  });
});
