"use client";
/**
 * The compact form that starts a search: which shapes, the ranges of outline sizes, concrete
 * strengths, steel grades, bar sizes and brace levels to enumerate, and the detailing caps.
 * Defaults come from the optimizer's default space trimmed to the mark's limits (architect's
 * widths, square only, sway columns without brace levels) and to the f'c the price book prices.
 */
import { useId, useState, type ReactNode } from "react";
import { DEFAULT_SPACE } from "@/lib/validation/optimize-request";
import type { BarSize } from "@/engine/types";
import { US_BAR_SIZES } from "@/engine/rebar";
import { NumberField } from "@/components/projects/number-field";
import { formatNumber, toDisplay, type UnitSystem } from "@/components/projects/units";
import type { MarkLimits, MarkMember } from "@/lib/validation/mark";

export type Range = [number, number, number];

export interface SpaceChoice {
  shapes: Array<"rect" | "circle">;
  b: Range;
  h: Range;
  D: Range;
  fc: number[];
  fy: number[];
  sizes: BarSize[];
  braceLevels: number[];
  rhoMax: number;
  spiral: boolean;
  squareOnly: boolean;
}

/** The space sent to POST /api/marks/{id}/searches (cover, dagg and the width limit are added by the server). */
export function toRequestSpace(s: SpaceChoice) {
  const rect = s.shapes.includes("rect");
  const circle = s.shapes.includes("circle");
  return {
    shapes: s.shapes,
    ...(rect ? { b: s.b, h: s.h } : {}),
    ...(circle ? { D: s.D } : {}),
    fc: s.fc,
    fy: s.fy,
    sizes: s.sizes,
    braceLevels: s.braceLevels,
    rhoMax: s.rhoMax,
    confinement: circle && s.spiral ? (["tied", "spiral"] as Array<"tied" | "spiral">) : (["tied"] as Array<"tied" | "spiral">),
    ...(s.squareOnly && rect ? { squareOnly: true } : {}),
  };
}

function clip(range: Range, max: number | undefined): Range {
  if (max === undefined) return range;
  const hi = Math.max(range[0], Math.min(range[1], max));
  return [Math.min(range[0], hi), hi, range[2]];
}

/** Sensible starting values for this mark. */
export function defaultSpace(limits: MarkLimits, member: MarkMember, pricedFc: number[]): SpaceChoice {
  const l = limits as MarkLimits & { maxB?: number; maxH?: number; maxD?: number; maxWidth?: number; squareOnly?: boolean };
  const width = l.maxWidth;
  const minOf = (...v: Array<number | undefined>) => {
    const nums = v.filter((x): x is number => typeof x === "number");
    return nums.length > 0 ? Math.min(...nums) : undefined;
  };
  const fc = DEFAULT_SPACE.fc.filter((f) => pricedFc.some((p) => Math.abs(p - f) < 1e-6));
  return {
    shapes: [...DEFAULT_SPACE.shapes],
    b: clip(DEFAULT_SPACE.b, minOf(l.maxB, width)),
    h: clip(DEFAULT_SPACE.h, minOf(l.maxH, width)),
    D: clip(DEFAULT_SPACE.D, minOf(l.maxD, width)),
    fc: fc.length > 0 ? fc : pricedFc.slice(0, 4),
    fy: [...DEFAULT_SPACE.fy],
    sizes: [...DEFAULT_SPACE.sizes],
    braceLevels: member.braced ? [...DEFAULT_SPACE.braceLevels] : [0],
    rhoMax: DEFAULT_SPACE.rhoMax,
    spiral: false,
    squareOnly: Boolean(l.squareOnly),
  };
}

/** Rough size of the enumerated space before detailing limits (outlines × f'c × fy × sizes × brace levels). */
function roughCount(s: SpaceChoice): number {
  const n = (r: Range) => (r[2] > 0 && r[1] >= r[0] ? Math.floor((r[1] - r[0]) / r[2] + 1e-9) + 1 : 0);
  const rect = s.shapes.includes("rect") ? (s.squareOnly ? n(s.b) : n(s.b) * n(s.h)) : 0;
  const circle = s.shapes.includes("circle") ? n(s.D) * (s.spiral ? 2 : 1) : 0;
  return (rect + circle) * s.fc.length * s.fy.length * s.sizes.length * s.braceLevels.length;
}

export interface SpaceFormProps {
  initial: SpaceChoice;
  units: UnitSystem;
  pricedFc: number[];
  braced: boolean;
  limitNote?: string;
  /** server issues keyed by path ("space.b", "space.fc.0", ...) */
  issues: Record<string, string>;
  busy: boolean;
  onSubmit: (space: SpaceChoice) => void;
}

function issueFor(issues: Record<string, string>, field: string): string | undefined {
  const key = Object.keys(issues).find((k) => k === `space.${field}` || k.startsWith(`space.${field}.`));
  return key ? issues[key] : undefined;
}

function toggle<T>(list: T[], value: T, on: boolean): T[] {
  return on ? (list.includes(value) ? list : [...list, value]) : list.filter((v) => v !== value);
}

function CheckGroup({ legend, error, children }: { legend: string; error?: string; children: ReactNode }) {
  return (
    <fieldset>
      <legend className="field-label">{legend}</legend>
      <div className="mt-1 flex flex-wrap gap-x-3 gap-y-1 text-sm">{children}</div>
      {error ? <p className="field-error">{error}</p> : null}
    </fieldset>
  );
}

function Check({ label, checked, onChange, disabled }: { label: string; checked: boolean; onChange: (on: boolean) => void; disabled?: boolean }) {
  return (
    <label className="inline-flex items-center gap-1.5">
      <input type="checkbox" checked={checked} disabled={disabled} onChange={(e) => onChange(e.target.checked)} />
      {label}
    </label>
  );
}

function RangeFields({ name, value, onChange, units, error }: { name: string; value: Range; onChange: (r: Range) => void; units: UnitSystem; error?: string }) {
  const set = (i: 0 | 1 | 2) => (v: number | undefined) => {
    const next: Range = [...value];
    next[i] = v ?? 0;
    onChange(next);
  };
  return (
    <fieldset>
      <legend className="sr-only">{name} range</legend>
      <div className="grid grid-cols-3 gap-2">
        <NumberField label={`${name} from`} value={value[0]} onChange={set(0)} quantity="length" units={units} min={0} />
        <NumberField label={`${name} to`} value={value[1]} onChange={set(1)} quantity="length" units={units} min={0} />
        <NumberField label={`${name} step`} value={value[2]} onChange={set(2)} quantity="length" units={units} min={0} />
      </div>
      {error ? <p className="field-error">{error}</p> : null}
    </fieldset>
  );
}

export function SpaceForm({ initial, units, pricedFc, braced, limitNote, issues, busy, onSubmit }: SpaceFormProps) {
  const [space, setSpace] = useState<SpaceChoice>(initial);
  const formId = useId();
  const set = <K extends keyof SpaceChoice>(key: K, value: SpaceChoice[K]) => setSpace((s) => ({ ...s, [key]: value }));
  const rect = space.shapes.includes("rect");
  const circle = space.shapes.includes("circle");
  const fcChoices = [...new Set([...pricedFc, ...space.fc])].sort((a, b) => a - b);
  const fyChoices = [...new Set([60, 75, 80, ...space.fy])].sort((a, b) => a - b);
  const count = roughCount(space);
  return (
    <form
      aria-labelledby={`${formId}-title`}
      className="panel space-y-4"
      onSubmit={(e) => {
        e.preventDefault();
        onSubmit(space);
      }}
    >
      <div>
        <h2 id={`${formId}-title`} className="text-lg font-semibold">
          Search space
        </h2>
        <p className="text-sm text-ink-700">
          Every combination below is detailed, checked with slenderness over every load combination, priced with the project&apos;s price book and kept when it passes.
          {limitNote ? ` Mark limit: ${limitNote}.` : ""}
        </p>
      </div>
      <CheckGroup legend="Shapes" error={issueFor(issues, "shapes")}>
        <Check label="Rectangular (tied)" checked={rect} onChange={(on) => set("shapes", toggle(space.shapes, "rect", on))} />
        <Check label="Circular" checked={circle} onChange={(on) => set("shapes", toggle(space.shapes, "circle", on))} />
        {circle ? <Check label="also spirals for circles" checked={space.spiral} onChange={(on) => set("spiral", on)} /> : null}
        {rect ? <Check label="square only (b = h)" checked={space.squareOnly} onChange={(on) => set("squareOnly", on)} /> : null}
      </CheckGroup>
      <div className="grid gap-4 md:grid-cols-3">
        {rect ? <RangeFields name="b" value={space.b} onChange={(r) => set("b", r)} units={units} error={issueFor(issues, "b")} /> : null}
        {rect && !space.squareOnly ? <RangeFields name="h" value={space.h} onChange={(r) => set("h", r)} units={units} error={issueFor(issues, "h")} /> : null}
        {circle ? <RangeFields name="D" value={space.D} onChange={(r) => set("D", r)} units={units} error={issueFor(issues, "D")} /> : null}
      </div>
      <div className="grid gap-4 md:grid-cols-2">
        <CheckGroup legend={`f′c (${units === "SI" ? "MPa" : "ksi"}, priced in the price book)`} error={issueFor(issues, "fc") ?? Object.entries(issues).find(([k]) => k.startsWith("prices.concrete") || k.startsWith("carbon.concrete"))?.[1]}>
          {fcChoices.map((fc) => (
            <Check key={fc} label={formatNumber(toDisplay(fc, "stress", units), units === "SI" ? 0 : 2)} checked={space.fc.includes(fc)} onChange={(on) => set("fc", toggle(space.fc, fc, on).sort((a, b) => a - b))} />
          ))}
        </CheckGroup>
        <CheckGroup legend={`fy (${units === "SI" ? "MPa" : "ksi"})`} error={issueFor(issues, "fy")}>
          {fyChoices.map((fy) => (
            <Check key={fy} label={formatNumber(toDisplay(fy, "stress", units), 0)} checked={space.fy.includes(fy)} onChange={(on) => set("fy", toggle(space.fy, fy, on).sort((a, b) => a - b))} />
          ))}
        </CheckGroup>
        <CheckGroup legend="Bar sizes" error={issueFor(issues, "sizes")}>
          {US_BAR_SIZES.filter((s) => s !== "#3" && s !== "#4").map((size) => (
            <Check key={size} label={size} checked={space.sizes.includes(size)} onChange={(on) => set("sizes", US_BAR_SIZES.filter((s) => (s === size ? on : space.sizes.includes(s))))} />
          ))}
        </CheckGroup>
        <CheckGroup legend="Intermediate brace levels" error={issueFor(issues, "braceLevels")}>
          {[0, 1, 2, 3].map((n) => (
            <Check key={n} label={String(n)} checked={space.braceLevels.includes(n)} disabled={!braced && n > 0} onChange={(on) => set("braceLevels", toggle(space.braceLevels, n, on).sort((a, b) => a - b))} />
          ))}
          {!braced ? <span className="text-xs text-ink-500">sway column: brace levels are not searched</span> : null}
        </CheckGroup>
      </div>
      <div className="grid gap-4 md:grid-cols-3">
        <NumberField
          label="Largest steel ratio ρmax"
          value={space.rhoMax}
          onChange={(v) => set("rhoMax", v ?? 0)}
          step="0.005"
          error={issueFor(issues, "rhoMax")}
          hint="0.01 to 0.08 (10.6.1.1); 0.04 leaves room for lap splices (common practice)"
        />
      </div>
      {Object.entries(issues).filter(([k]) => !k.startsWith("space.") && !k.startsWith("prices.concrete") && !k.startsWith("carbon.concrete")).length > 0 ? (
        <ul role="alert" className="list-disc pl-5 text-sm text-strained-600">
          {Object.entries(issues)
            .filter(([k]) => !k.startsWith("space.") && !k.startsWith("prices.concrete") && !k.startsWith("carbon.concrete"))
            .map(([k, m]) => (
              <li key={k}>
                {k}: {m}
              </li>
            ))}
        </ul>
      ) : null}
      <div className="flex flex-wrap items-center gap-3">
        <button type="submit" className="btn-primary" disabled={busy || count === 0}>
          {busy ? "Starting…" : "Start search"}
        </button>
        <span className="text-sm text-ink-500 tabular-nums">about {formatNumber(count, 0)} combinations before detailing limits</span>
      </div>
    </form>
  );
}
