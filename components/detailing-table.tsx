/** The detailing checks of a section (steel ratio, bar count, spacing, cover, ties, spiral), each with its clause. */
import type { DetailingResult } from "@/engine/types";
import { formatNumber, formatQuantity, type UnitSystem } from "@/components/projects/units";

export interface DetailingTableProps {
  detailing: DetailingResult[];
  units?: UnitSystem;
}

const NAMES: Record<string, { label: string; compare: string }> = {
  "rho-min": { label: "Steel ratio ρ, minimum", compare: "≥" },
  "rho-max": { label: "Steel ratio ρ, maximum", compare: "≤" },
  "bar-count": { label: "Number of longitudinal bars", compare: "≥" },
  "clear-spacing": { label: "Clear spacing between bars", compare: "≥" },
  cover: { label: "Clear cover to ties", compare: "≥" },
  "tie-size": { label: "Tie size (bar diameter)", compare: "≥" },
  "tie-spacing": { label: "Tie spacing", compare: "≤" },
  "lateral-support": { label: "Clear distance to a held bar", compare: "≤" },
  "spiral-ratio": { label: "Spiral ratio ρs", compare: "≥" },
  "spiral-pitch-min": { label: "Spiral clear pitch, minimum", compare: "≥" },
  "spiral-pitch-max": { label: "Spiral clear pitch, maximum", compare: "≤" },
  "spiral-size": { label: "Spiral bar diameter", compare: "≥" },
};

function show(v: number, unit: string | undefined, units: UnitSystem): string {
  return unit === "in" ? formatQuantity(v, "length", units) : formatNumber(v, 4);
}

export function DetailingTable({ detailing, units = "US" }: DetailingTableProps) {
  return (
    <table className="w-full border-collapse text-sm" aria-label="Detailing checks" data-testid="detailing-table">
      <thead>
        <tr className="border-b border-stone-200 text-left text-ink-500">
          <th className="py-1 pr-2 font-medium">Check</th>
          <th className="py-1 pr-2 font-medium">Provided</th>
          <th className="py-1 pr-2 font-medium">Limit</th>
          <th className="py-1 pr-2 font-medium">Result</th>
          <th className="py-1 font-medium">Clause</th>
        </tr>
      </thead>
      <tbody>
        {detailing.map((d) => {
          const name = NAMES[d.rule] ?? { label: d.rule, compare: "" };
          return (
            <tr key={d.rule} className="border-b border-stone-100 align-top">
              <td className="py-1 pr-2">
                {name.label}
                {d.message ? <span className="block text-xs text-ink-500">{d.message}</span> : null}
              </td>
              <td className="py-1 pr-2 tabular-nums">{show(d.value, d.unit, units)}</td>
              <td className="py-1 pr-2 tabular-nums">
                {name.compare} {show(d.limit, d.unit, units)}
              </td>
              <td className={`py-1 pr-2 ${d.ok ? "text-sound-600" : "font-semibold text-strained-600"}`}>{d.ok ? "✓ meets" : "✗ does not meet"}</td>
              <td className="py-1 whitespace-nowrap text-ink-500">ACI 318-19 {d.clause}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
