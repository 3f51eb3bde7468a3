/**
 * The moment-magnifier chain of one load combination about one axis, step by step with the
 * clause beside each: k ℓu/r against its limit, EI, Pc, Cm, δ (and δs for sway columns), the
 * first-order moment after M2,min, Mc, φMn at Pu and the ratio.
 */
import type { AxisResult, CaseResult, EiOption } from "@/engine/types";
import { formatNumber, formatQuantity, type UnitSystem } from "@/components/projects/units";

export interface MagnifierChainProps {
  result: CaseResult;
  axis: "x" | "y";
  braced: boolean;
  ei: EiOption;
  k: number;
  units?: UnitSystem;
}

const EI_TEXT: Record<EiOption, string> = {
  a: "0.4 Ec Ig / (1 + βdns)",
  b: "(0.2 Ec Ig + Es Ise) / (1 + βdns)",
  c: "Ec I / (1 + βdns), I per Table 6.6.3.1.1(b)",
};

interface Step {
  symbol: string;
  value: string;
  rule: string;
  clause: string;
  flag?: boolean;
}

function stepsOf(a: AxisResult, p: MagnifierChainProps): Step[] {
  const { units = "US" } = p;
  const steps: Step[] = [
    {
      symbol: "k ℓu / r",
      value: `${formatNumber(a.klur, 1)} vs limit ${formatNumber(a.limit, 1)}`,
      rule: a.slender ? "above the limit: slenderness must be considered" : "within the limit: slenderness may be neglected (δ = 1)",
      clause: p.braced ? "6.2.5.1(b), (c)" : "6.2.5.1(a)",
      flag: a.slender,
    },
  ];
  if (a.slender) {
    steps.push(
      { symbol: "EI", value: formatQuantity(a.EI, "stiffness", units), rule: `option (${p.ei}) ${EI_TEXT[p.ei]}`, clause: "6.6.4.4.4" },
      { symbol: "Pc", value: formatQuantity(a.Pc, "force", units), rule: `π² EI / (k ℓu)², k = ${formatNumber(p.k, 3)}`, clause: "6.6.4.4.2" },
      { symbol: "Cm", value: formatNumber(a.Cm, 3), rule: "0.6 − 0.4 M1/M2, or 1.0 with transverse load or where M2,min governs", clause: "6.6.4.5.3" },
    );
    if (a.deltaS !== undefined) {
      steps.push({ symbol: "δs", value: a.deltaS === null ? "unstable" : formatNumber(a.deltaS, 3), rule: "sway magnifier on the sway moments: M = Mns + δs Ms", clause: "6.6.4.6", flag: a.deltaS === null });
    }
    steps.push({
      symbol: "δ",
      value: a.delta === null ? "none: Pu ≥ 0.75 Pc (unstable)" : formatNumber(a.delta, 3),
      rule: "Cm / (1 − Pu / (0.75 Pc)) ≥ 1.0",
      clause: "6.6.4.5.2",
      flag: a.delta === null || a.delta > 1.4,
    });
  }
  steps.push(
    { symbol: "M2", value: formatQuantity(a.M2, "moment", units), rule: a.slender ? "larger end moment, not less than M2,min = Pu (0.6 + 0.03 h)" : "larger first-order end moment", clause: a.slender ? "6.6.4.5.4" : "6.6.4.5.1" },
    { symbol: "Mc", value: formatQuantity(a.Mc, "moment", units), rule: a.slender ? "δ M2; not more than 1.4 × the first-order moment" : "= M2 (no magnification)", clause: a.slender ? "6.6.4.5.1, 6.2.5.3" : "6.6.4.5.1", flag: a.M2 > 0 && a.Mc > 1.4 * a.M2 + 1e-9 },
    { symbol: "φMn at Pu", value: formatQuantity(a.phiMn, "moment", units), rule: "design moment strength at the combination's axial load (strain compatibility)", clause: "22.4, Table 21.2.2" },
    { symbol: "Mc / φMn", value: a.ratio === null ? "unbounded" : formatNumber(a.ratio, 3), rule: "≤ 1.0 passes", clause: "22.4", flag: a.ratio === null || a.ratio > 1 },
  );
  return steps;
}

export function MagnifierChain(props: MagnifierChainProps) {
  const a = props.result[props.axis];
  const steps = stepsOf(a, props);
  return (
    <table className="w-full border-collapse text-sm" aria-label={`Moment magnifier about ${props.axis} for ${props.result.name}`} data-testid={`magnifier-${props.axis}`}>
      <caption className="mb-1 text-left font-medium">
        Bending about {props.axis} — {props.result.name}
        {props.result.segment > 0 ? ` (segment ${props.result.segment} between braces)` : ""}
      </caption>
      <thead>
        <tr className="border-b border-stone-200 text-left text-ink-500">
          <th className="py-1 pr-2 font-medium">Step</th>
          <th className="py-1 pr-2 font-medium">Value</th>
          <th className="py-1 pr-2 font-medium">Rule</th>
          <th className="py-1 font-medium">Clause</th>
        </tr>
      </thead>
      <tbody>
        {steps.map((s) => (
          <tr key={s.symbol} className="border-b border-stone-100 align-top">
            <th scope="row" className="whitespace-nowrap py-1 pr-2 text-left font-mono font-normal">
              {s.symbol}
            </th>
            <td className={`whitespace-nowrap py-1 pr-2 tabular-nums ${s.flag ? "font-semibold text-strained-600" : ""}`}>{s.value}</td>
            <td className="py-1 pr-2 text-ink-700">{s.rule}</td>
            <td className="py-1 whitespace-nowrap text-ink-500">ACI 318-19 {s.clause}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
