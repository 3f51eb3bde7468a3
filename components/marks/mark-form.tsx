"use client";
/**
 * A column mark's data: label, level, number of identical columns; unbraced length per axis,
 * braced or sway, k per axis given or from ψ at both ends (with the joint helper), transverse
 * load (Cm = 1); the architect's size limits; and the current design (section, f′c, fy, bars,
 * confinement, brace levels). Creates a mark, or saves one at its version (409 shows what changed).
 */
import { useState } from "react";
import { useRouter } from "next/navigation";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { solveEffectiveLength, US_BAR_SIZES } from "@/engine";
import type { LayoutInput, SectionInput } from "@/engine/types";
import type { MarkDesign, MarkLimits, MarkMember } from "@/lib/validation/mark";
import { ApiError, callApi, issuesByPath } from "@/components/projects/api";
import { ConflictNotice } from "@/components/projects/conflict-notice";
import { NumberField } from "@/components/projects/number-field";
import { formatNumber, type UnitSystem } from "@/components/projects/units";
import { useDraft } from "@/components/projects/use-draft";
import { PsiHelper } from "./psi-helper";
import { describeSection, type MarkRecord } from "./mark-types";

export interface MarkDraft {
  label: string;
  level: string;
  quantity: number;
  member: MarkMember;
  limits: MarkLimits;
  design: MarkDesign;
}

export interface MarkFormProps {
  projectId: string;
  workspaceId: string;
  units: UnitSystem;
  /** project defaults for a new mark's section */
  defaults: { cover: number };
  /** the mark being edited; absent for a new one */
  mark?: MarkRecord;
  canEdit: boolean;
  onSaved?: (mark: MarkRecord) => void;
  /** the parent saw this version saved (the form remounts per version, so it cannot remember) */
  justSaved?: boolean;
}

export function newMarkDraft(cover: number): MarkDraft {
  return {
    label: "",
    level: "",
    quantity: 1,
    member: { lu: 144, kx: 1, ky: 1, braced: true, transverseLoad: false },
    limits: {},
    design: {
      section: { shape: "rect", b: 16, h: 16, fc: 5, fy: 60, confinement: "tied", cover, layout: { type: "perimeter", size: "#8", nb: 3, nh: 3 } },
      braceLevels: 0,
    },
  };
}

function draftOf(mark: MarkRecord): MarkDraft {
  return { label: mark.label, level: mark.level, quantity: mark.quantity, member: mark.member, limits: mark.limits, design: mark.design };
}

/** The current design against the architect's limits (a warning: the check itself does not use them). */
function limitWarnings(d: MarkDraft): string[] {
  const s = d.design.section;
  const l = d.limits;
  const why = l.note ? ` (${l.note})` : "";
  const out: string[] = [];
  if (s.shape === "rect") {
    if (l.maxB !== undefined && (s.b ?? 0) > l.maxB) out.push(`b = ${s.b} in is over the largest b of ${l.maxB} in${why}.`);
    if (l.maxH !== undefined && (s.h ?? 0) > l.maxH) out.push(`h = ${s.h} in is over the largest h of ${l.maxH} in${why}.`);
    if (l.squareOnly && s.b !== s.h) out.push(`The section is not square${why}.`);
  } else if (l.maxD !== undefined && (s.D ?? 0) > l.maxD) out.push(`D = ${s.D} in is over the largest D of ${l.maxD} in${why}.`);
  return out;
}

const CONFLICT_FIELDS = [
  { key: "label", label: "Mark" },
  { key: "level", label: "Level" },
  { key: "quantity", label: "Number of columns" },
  { key: "member", label: "Member data" },
  { key: "limits", label: "Size limits" },
  { key: "design", label: "Current design" },
];

export function MarkForm({ projectId, workspaceId, units, defaults, mark, canEdit, onSaved, justSaved }: MarkFormProps) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [draft, setDraft, clearDraft, restored] = useDraft<MarkDraft>(mark ? `mark:${mark.id}` : `new-mark:${projectId}`, mark ? draftOf(mark) : newMarkDraft(defaults.cover), mark?.version ?? 0);
  const [helper, setHelper] = useState<string | null>(null);
  const [savedAt, setSavedAt] = useState<number | null>(null);

  const save = useMutation({
    mutationFn: async () => {
      if (mark) return (await callApi<{ mark: MarkRecord }>(`/api/marks/${mark.id}`, { method: "PATCH", body: { version: mark.version, ...draft } })).mark;
      return (await callApi<{ mark: MarkRecord }>(`/api/projects/${projectId}/marks`, { method: "POST", body: draft })).mark;
    },
    onSuccess: async (saved) => {
      clearDraft();
      setSavedAt(Date.now());
      await queryClient.invalidateQueries({ queryKey: ["marks", projectId] });
      await queryClient.invalidateQueries({ queryKey: ["mark", saved.id] });
      if (!mark) router.push(`/w/${workspaceId}/projects/${projectId}/marks/${saved.id}`);
      onSaved?.(saved);
    },
  });
  const errors = issuesByPath(save.error);
  const conflict = save.error instanceof ApiError && save.error.status === 409 ? (save.error.current as MarkRecord) : null;

  const m = draft.member;
  const s = draft.design.section;
  const setMember = (patch: Partial<MarkMember>) => setDraft({ ...draft, member: { ...m, ...patch } });
  const setSection = (patch: Partial<SectionInput>) => setDraft({ ...draft, design: { ...draft.design, section: { ...s, ...patch } as SectionInput } });
  const setLayout = (layout: LayoutInput) => setSection({ layout });
  const layout = s.layout ?? { type: "perimeter", size: "#8", nb: 3, nh: 3 };

  function kPreview(axis: "x" | "y"): string {
    const pair = m.psi?.[axis];
    if (!pair) return "";
    try {
      return `k = ${formatNumber(solveEffectiveLength(pair.top, pair.bottom, !m.braced), 3)} (${m.braced ? "braced" : "sway"} alignment-chart equation, R6.2.5)`;
    } catch (e) {
      return e instanceof Error ? e.message : "";
    }
  }

  function setPsi(axis: "x" | "y", end: "top" | "bottom", v: number | undefined) {
    const pair = { top: m.psi?.[axis]?.top ?? 1, bottom: m.psi?.[axis]?.bottom ?? 1, [end]: v ?? 0 };
    setMember({ psi: { ...(m.psi ?? {}), [axis]: pair } });
  }

  function setKMode(axis: "x" | "y", mode: "given" | "psi") {
    const psi = { ...(m.psi ?? {}) };
    if (mode === "psi") psi[axis] = { top: 1, bottom: 1 };
    else delete psi[axis];
    setMember({ psi: Object.keys(psi).length ? psi : undefined });
  }

  const transverse = m.transverseLoad === true || (typeof m.transverseLoad === "object" && (m.transverseLoad.x || m.transverseLoad.y));

  return (
    <form
      aria-label={mark ? `Column mark ${mark.label}` : "New column mark"}
      className="space-y-6"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate();
      }}
    >
      {restored ? <p className="text-sm text-ink-500">Unsaved changes from your last visit were restored.</p> : null}
      <fieldset disabled={!canEdit} className="space-y-6">
        <section className="panel grid gap-4 sm:grid-cols-3" aria-label="Mark">
          <div>
            <label htmlFor="mk-label" className="field-label">
              Mark (grid or stack)
            </label>
            <input id="mk-label" className="field-input" value={draft.label} placeholder="e.g. C-4" onChange={(e) => setDraft({ ...draft, label: e.target.value })} />
            {errors.label ? <p className="field-error">{errors.label}</p> : null}
          </div>
          <div>
            <label htmlFor="mk-level" className="field-label">
              Level
            </label>
            <input id="mk-level" className="field-input" value={draft.level} placeholder="e.g. L1–L2" onChange={(e) => setDraft({ ...draft, level: e.target.value })} />
            {errors.level ? <p className="field-error">{errors.level}</p> : null}
          </div>
          <NumberField label="Number of identical columns" step="1" min={1} value={draft.quantity} onChange={(v) => setDraft({ ...draft, quantity: v ?? 1 })} error={errors.quantity} />
        </section>

        <section className="panel space-y-4" aria-label="Member">
          <h2 className="font-semibold">Member</h2>
          <div className="grid gap-4 sm:grid-cols-3">
            <NumberField label="Unbraced length ℓu" quantity="length" units={units} value={m.lu} onChange={(v) => setMember({ lu: v ?? 0 })} error={errors["member.lu"]} hint="Clear height; used for both axes unless given below." />
            <NumberField label="ℓu for bending about x (optional)" quantity="length" units={units} value={m.lux} onChange={(v) => setMember({ lux: v })} error={errors["member.lux"]} />
            <NumberField label="ℓu for bending about y (optional)" quantity="length" units={units} value={m.luy} onChange={(v) => setMember({ luy: v })} error={errors["member.luy"]} />
          </div>
          <fieldset>
            <legend className="field-label">Frame</legend>
            <div className="mt-1 flex gap-4 text-sm">
              <label className="flex items-center gap-2">
                <input type="radio" name="braced" checked={m.braced} onChange={() => setMember({ braced: true, sway: undefined })} /> Braced (nonsway, 6.6.4.5)
              </label>
              <label className="flex items-center gap-2">
                <input type="radio" name="braced" checked={!m.braced} onChange={() => setMember({ braced: false })} /> Sway (6.6.4.6)
              </label>
            </div>
          </fieldset>
          <div className="grid gap-4 sm:grid-cols-2">
            {(["x", "y"] as const).map((axis) => {
              const mode = m.psi?.[axis] ? "psi" : "given";
              return (
                <fieldset key={axis} className="rounded-md border border-stone-200 p-3">
                  <legend className="px-1 text-sm font-medium">Effective length factor k{axis}</legend>
                  <div className="flex gap-4 text-sm">
                    <label className="flex items-center gap-2">
                      <input type="radio" name={`kmode-${axis}`} checked={mode === "given"} onChange={() => setKMode(axis, "given")} /> given
                    </label>
                    <label className="flex items-center gap-2">
                      <input type="radio" name={`kmode-${axis}`} checked={mode === "psi"} onChange={() => setKMode(axis, "psi")} /> from ψ at both ends
                    </label>
                  </div>
                  {mode === "given" ? (
                    <NumberField label={`k${axis}`} value={axis === "x" ? m.kx : m.ky} onChange={(v) => setMember(axis === "x" ? { kx: v ?? 1 } : { ky: v ?? 1 })} error={errors[`member.k${axis}`]} hint={m.braced ? "1.0 is allowed for braced columns (6.6.4.4.3)." : "Sway columns have k ≥ 1."} />
                  ) : (
                    <div className="mt-2 space-y-2">
                      <div className="grid grid-cols-2 gap-2">
                        {(["top", "bottom"] as const).map((end) => (
                          <div key={end}>
                            <NumberField label={`ψ at the ${end}`} value={m.psi?.[axis]?.[end]} onChange={(v) => setPsi(axis, end, v)} error={errors[`member.psi.${axis}.${end}`]} />
                            <button type="button" className="mt-1 text-xs text-oxide-700 underline" onClick={() => setHelper(`${axis}-${end}`)}>
                              work out ψ from the framing members
                            </button>
                          </div>
                        ))}
                      </div>
                      <p className="text-xs text-ink-700" aria-live="polite">
                        {kPreview(axis)}
                      </p>
                      {helper?.startsWith(`${axis}-`) ? (
                        <PsiHelper
                          units={units}
                          fc={s.fc}
                          joint={`${helper.endsWith("top") ? "top" : "bottom"} of the column, bending about ${axis}`}
                          onUse={(psi) => {
                            setPsi(axis, helper.endsWith("top") ? "top" : "bottom", psi);
                            setHelper(null);
                          }}
                          onClose={() => setHelper(null)}
                        />
                      ) : null}
                    </div>
                  )}
                </fieldset>
              );
            })}
          </div>
          <label className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={Boolean(transverse)} onChange={(e) => setMember({ transverseLoad: e.target.checked })} /> Transverse load between the supports (Cm = 1.0, 6.6.4.5.3)
          </label>
          {!m.braced ? (
            <div className="grid gap-4 sm:grid-cols-2">
              {(["x", "y"] as const).map((axis) => {
                const d = m.sway?.[axis];
                const q = d && "Q" in d ? d.Q : undefined;
                return (
                  <NumberField
                    key={axis}
                    label={`Stability index Q of the storey, bending about ${axis}`}
                    value={q}
                    onChange={(v) => {
                      const sway = { ...(m.sway ?? {}) };
                      if (v === undefined) delete sway[axis];
                      else sway[axis] = { Q: v };
                      setMember({ sway: Object.keys(sway).length ? sway : undefined });
                    }}
                    error={errors[`member.sway.${axis}.Q`] ?? errors[`member.sway.${axis}`]}
                    hint="Q = ΣPu Δo / (Vus ℓc), 6.6.4.4.1; δs = 1/(1 − Q). Without it a slender sway column fails."
                  />
                );
              })}
            </div>
          ) : null}
          {errors["member.sway"] ? <p className="field-error">{errors["member.sway"]}</p> : null}
        </section>

        <section className="panel space-y-4" aria-label="Size limits">
          <h2 className="font-semibold">Size limits (architect or owner)</h2>
          <div className="grid gap-4 sm:grid-cols-3">
            <NumberField label="Largest b" quantity="length" units={units} value={draft.limits.maxB} onChange={(v) => setDraft({ ...draft, limits: { ...draft.limits, maxB: v } })} error={errors["limits.maxB"]} />
            <NumberField label="Largest h" quantity="length" units={units} value={draft.limits.maxH} onChange={(v) => setDraft({ ...draft, limits: { ...draft.limits, maxH: v } })} error={errors["limits.maxH"]} />
            <NumberField label="Largest D (round)" quantity="length" units={units} value={draft.limits.maxD} onChange={(v) => setDraft({ ...draft, limits: { ...draft.limits, maxD: v } })} error={errors["limits.maxD"]} />
          </div>
          <div className="flex flex-wrap items-end gap-4">
            <label className="flex items-center gap-2 text-sm">
              <input type="checkbox" checked={draft.limits.squareOnly ?? false} onChange={(e) => setDraft({ ...draft, limits: { ...draft.limits, squareOnly: e.target.checked || undefined } })} /> Square sections only
            </label>
            <div className="grow">
              <label htmlFor="mk-limit-note" className="field-label">
                Why (shown with the limit)
              </label>
              <input id="mk-limit-note" className="field-input" value={draft.limits.note ?? ""} placeholder="e.g. max 24 in wide — architect's limit" onChange={(e) => setDraft({ ...draft, limits: { ...draft.limits, note: e.target.value || undefined } })} />
            </div>
          </div>
        </section>

        <section className="panel space-y-4" aria-label="Current design">
          <h2 className="font-semibold">Current design</h2>
          <p className="text-sm text-ink-500">{describeSection(s, units)}</p>
          {limitWarnings(draft).map((w) => (
            <p key={w} className="text-sm font-medium text-strained-600">
              {w}
            </p>
          ))}
          <div className="grid gap-4 sm:grid-cols-4">
            <div>
              <label htmlFor="mk-shape" className="field-label">
                Shape
              </label>
              <select
                id="mk-shape"
                className="field-input"
                value={s.shape}
                onChange={(e) =>
                  e.target.value === "circle"
                    ? setDraft({ ...draft, design: { ...draft.design, section: { shape: "circle", D: Math.max(s.b ?? 18, s.h ?? 18), fc: s.fc, fy: s.fy, confinement: s.confinement, cover: s.cover, layout: { type: "circle", size: layout.size, n: 8 } } } })
                    : setDraft({ ...draft, design: { ...draft.design, section: { shape: "rect", b: s.D ?? 16, h: s.D ?? 16, fc: s.fc, fy: s.fy, confinement: "tied", cover: s.cover, layout: { type: "perimeter", size: layout.size, nb: 3, nh: 3 } } } })
                }
              >
                <option value="rect">rectangular</option>
                <option value="circle">round</option>
              </select>
            </div>
            {s.shape === "rect" ? (
              <>
                <NumberField label="b (width; depth for bending about y)" quantity="length" units={units} value={s.b} onChange={(v) => setSection({ b: v })} error={errors["design.section.b"]} />
                <NumberField label="h (depth for bending about x)" quantity="length" units={units} value={s.h} onChange={(v) => setSection({ h: v })} error={errors["design.section.h"]} />
              </>
            ) : (
              <NumberField label="D (diameter)" quantity="length" units={units} value={s.D} onChange={(v) => setSection({ D: v })} error={errors["design.section.D"]} />
            )}
            <NumberField label="Clear cover to ties" quantity="length" units={units} value={s.cover} onChange={(v) => setSection({ cover: v ?? 0 })} error={errors["design.section.cover"]} />
            <NumberField label="f′c" quantity="stress" units={units} value={s.fc} onChange={(v) => setSection({ fc: v ?? 0 })} error={errors["design.section.fc"]} />
            <NumberField label="fy" quantity="stress" units={units} value={s.fy} onChange={(v) => setSection({ fy: v ?? 0 })} error={errors["design.section.fy"]} hint="≤ 80 ksi (Table 20.2.2.4(a))" />
            <div>
              <label htmlFor="mk-conf" className="field-label">
                Confinement
              </label>
              <select id="mk-conf" className="field-input" value={s.confinement} onChange={(e) => setSection({ confinement: e.target.value as SectionInput["confinement"] })}>
                <option value="tied">ties</option>
                {s.shape === "circle" ? <option value="spiral">spiral</option> : null}
              </select>
              {errors["design.section.confinement"] ? <p className="field-error">{errors["design.section.confinement"]}</p> : null}
            </div>
            <div>
              <label htmlFor="mk-bar" className="field-label">
                Bar size
              </label>
              <select id="mk-bar" className="field-input" value={layout.size} onChange={(e) => setLayout({ ...layout, size: e.target.value as LayoutInput["size"] })}>
                {US_BAR_SIZES.filter((b) => b !== "#3").map((b) => (
                  <option key={b} value={b}>
                    {b}
                  </option>
                ))}
              </select>
            </div>
            {s.shape === "rect" ? (
              <>
                <div>
                  <label htmlFor="mk-layout" className="field-label">
                    Bar arrangement
                  </label>
                  <select
                    id="mk-layout"
                    className="field-input"
                    value={layout.type}
                    onChange={(e) => setLayout(e.target.value === "faces" ? { type: "faces", size: layout.size, n: 3 } : { type: "perimeter", size: layout.size, nb: 3, nh: 3 })}
                  >
                    <option value="perimeter">around the perimeter</option>
                    <option value="faces">on the two faces normal to h</option>
                  </select>
                </div>
                {layout.type === "perimeter" ? (
                  <>
                    <NumberField label="Bars along each b face (nb, corners included)" step="1" min={2} value={layout.nb} onChange={(v) => setLayout({ ...layout, nb: v ?? 2 })} error={errors["design.section.layout.nb"]} />
                    <NumberField label="Bars along each h face (nh, corners included)" step="1" min={2} value={layout.nh} onChange={(v) => setLayout({ ...layout, nh: v ?? 2 })} error={errors["design.section.layout.nh"]} />
                  </>
                ) : layout.type === "faces" ? (
                  <NumberField label="Bars on each face (n)" step="1" min={2} value={layout.n} onChange={(v) => setLayout({ ...layout, n: v ?? 2 })} error={errors["design.section.layout.n"]} />
                ) : null}
              </>
            ) : layout.type === "circle" ? (
              <NumberField label="Number of bars" step="1" min={4} value={layout.n} onChange={(v) => setLayout({ ...layout, n: v ?? 6 })} error={errors["design.section.layout.n"]} />
            ) : null}
            <NumberField
              label="Intermediate brace levels"
              step="1"
              min={0}
              value={draft.design.braceLevels}
              onChange={(v) => setDraft({ ...draft, design: { ...draft.design, braceLevels: v ?? 0 } })}
              error={errors["design.braceLevels"]}
              hint="n levels split ℓu into n + 1 equal segments (braced columns)."
            />
            <div>
              <label htmlFor="mk-ei" className="field-label">
                EI option for this mark
              </label>
              <select id="mk-ei" className="field-input" value={draft.design.ei ?? ""} onChange={(e) => setDraft({ ...draft, design: { ...draft.design, ei: (e.target.value || undefined) as MarkDesign["ei"] } })}>
                <option value="">project default</option>
                <option value="a">(a) 0.4 Ec Ig</option>
                <option value="b">(b) 0.2 Ec Ig + Es Ise</option>
                <option value="c">(c) Ec I, Table 6.6.3.1.1(b)</option>
              </select>
            </div>
          </div>
          {errors["design.section"] || errors["design.section.layout"] ? <p className="field-error">{errors["design.section"] ?? errors["design.section.layout"]}</p> : null}
        </section>
      </fieldset>

      {conflict ? (
        <ConflictNotice
          mine={{ ...(mark ? draftOf(mark) : {}), version: mark?.version }}
          current={conflict as unknown as Record<string, unknown>}
          fields={CONFLICT_FIELDS}
          onReload={() => {
            clearDraft();
            if (mark) void queryClient.invalidateQueries({ queryKey: ["mark", mark.id] });
          }}
        />
      ) : save.isError && Object.keys(errors).length === 0 ? (
        <p role="alert" className="field-error">
          {save.error.message}
        </p>
      ) : save.isError ? (
        <p role="alert" className="field-error">
          Not saved: see the fields marked above.
        </p>
      ) : null}
      {canEdit ? (
        <div className="no-print flex items-center gap-3">
          <button type="submit" className="btn-primary" disabled={save.isPending}>
            {save.isPending ? "Saving…" : mark ? "Save the mark" : "Create the mark"}
          </button>
          {(savedAt || justSaved) && !save.isPending && !save.isError ? (
            <span role="status" className="text-sm text-sound-600">
              Saved.
            </span>
          ) : null}
        </div>
      ) : (
        <p className="text-sm text-ink-500">Your role reads column marks; owners and engineers change them.</p>
      )}
    </form>
  );
}
