"use client";
/**
 * ψ at one joint from the members framing into it (6.6.3.1.1 stiffnesses: 0.70 Ig for columns,
 * 0.35 Ig for beams, Ec from f′c): rectangular members by b × h and centre-to-centre length.
 */
import { useState } from "react";
import { computePsi, concreteModulus } from "@/engine";
import { formatNumber, fromDisplay, inputValue, unitLabel, type UnitSystem } from "@/components/projects/units";

interface Member {
  kind: "column" | "beam";
  b: string;
  h: string;
  length: string;
  fc: string;
}

export interface PsiHelperProps {
  units: UnitSystem;
  /** f′c of the checked column, ksi (the default for new rows) */
  fc: number;
  /** the joint's name, e.g. "top of the column, bending about x" */
  joint: string;
  onUse: (psi: number) => void;
  onClose: () => void;
}

export function PsiHelper({ units, fc, joint, onUse, onClose }: PsiHelperProps) {
  const fcShown = inputValue(fc, "stress", units);
  const [members, setMembers] = useState<Member[]>([
    { kind: "column", b: "", h: "", length: "", fc: fcShown },
    { kind: "column", b: "", h: "", length: "", fc: fcShown },
    { kind: "beam", b: "", h: "", length: "", fc: fcShown },
  ]);
  let psi: number | null = null;
  let problem: string | null = null;
  try {
    const toMember = (m: Member) => {
      const b = fromDisplay(Number(m.b), "length", units);
      const h = fromDisplay(Number(m.h), "length", units);
      const length = fromDisplay(Number(m.length), "length", units);
      const fcKsi = fromDisplay(Number(m.fc), "stress", units);
      return { Ec: concreteModulus(fcKsi), Ig: (b * h ** 3) / 12, length };
    };
    const filled = members.filter((m) => m.b && m.h && m.length && m.fc);
    const columns = filled.filter((m) => m.kind === "column").map(toMember);
    const beams = filled.filter((m) => m.kind === "beam").map(toMember);
    if (columns.length === 0) problem = "give at least one column (the one checked)";
    else psi = computePsi(columns, beams);
  } catch (e) {
    problem = e instanceof Error ? e.message : "check the numbers";
  }
  const L = unitLabel("length", units);
  const set = (i: number, patch: Partial<Member>) => setMembers(members.map((m, j) => (j === i ? { ...m, ...patch } : m)));

  return (
    <div role="dialog" aria-label={`ψ at the ${joint}`} className="mt-2 rounded-md border border-stone-300 bg-stone-50 p-3 text-sm">
      <p className="font-medium">ψ at the {joint}</p>
      <p className="text-xs text-ink-500">
        Σ(0.70 Ec Ig / ℓc) of the columns ÷ Σ(0.35 Ec Ig / ℓ) of the beams in the plane of bending (6.6.3.1.1). h is the depth in that plane; lengths centre to centre.
      </p>
      <table className="mt-2 w-full text-xs">
        <thead>
          <tr className="text-left text-ink-500">
            <th>Member</th>
            <th>b ({L})</th>
            <th>h ({L})</th>
            <th>length ({L})</th>
            <th>f′c ({unitLabel("stress", units)})</th>
            <th />
          </tr>
        </thead>
        <tbody>
          {members.map((m, i) => (
            <tr key={i}>
              <td>
                <select aria-label={`Member ${i + 1} kind`} value={m.kind} onChange={(e) => set(i, { kind: e.target.value as Member["kind"] })} className="rounded border border-stone-300 px-1">
                  <option value="column">column</option>
                  <option value="beam">beam</option>
                </select>
              </td>
              {(["b", "h", "length", "fc"] as const).map((k) => (
                <td key={k}>
                  <input aria-label={`Member ${i + 1} ${k}`} inputMode="decimal" className="w-20 rounded border border-stone-300 px-1" value={m[k]} onChange={(e) => set(i, { [k]: e.target.value })} />
                </td>
              ))}
              <td>
                <button type="button" className="underline" onClick={() => setMembers(members.filter((_, j) => j !== i))}>
                  remove
                </button>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <div className="mt-2 flex flex-wrap items-center gap-3">
        <button type="button" className="btn-quiet" onClick={() => setMembers([...members, { kind: "beam", b: "", h: "", length: "", fc: fcShown }])}>
          Add a member
        </button>
        <span aria-live="polite">
          {problem ? <span className="text-strained-600">{problem}</span> : psi !== null ? <>ψ = {Number.isFinite(psi) ? formatNumber(psi, 3) : "∞ (no beam: pinned; use 10, common practice)"}</> : null}
        </span>
        <button type="button" className="btn-primary" disabled={psi === null} onClick={() => psi !== null && onUse(Number.isFinite(psi) ? Number(psi.toFixed(3)) : 10)}>
          Use this ψ
        </button>
        <button type="button" className="btn-quiet" onClick={onClose}>
          Close
        </button>
      </div>
    </div>
  );
}
