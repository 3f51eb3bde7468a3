"use client";
/**
 * The interaction diagram of a section about one axis (ECharts): the nominal curve (Mn, Pn) and
 * the design curve (φMn, φPn), with each load combination plotted twice — its first-order point
 * (M2 after M2,min) and its magnified point (Mc) — joined by an arrow; failing points are marked
 * with a cross and named in the list under the chart. Values are given in US units (kip, kip-in)
 * and shown in the chosen display units.
 */
import dynamic from "next/dynamic";
import { useMemo } from "react";
import { toDisplay, unitLabel, formatQuantity, type UnitSystem } from "@/components/projects/units";

const ReactECharts = dynamic(() => import("echarts-for-react"), { ssr: false, loading: () => <div className="h-full animate-pulse bg-stone-50" /> });

export interface CurvePoint {
  /** moment, kip-in (≥ 0 on the plotted half) */
  M: number;
  /** axial load, kip, compression positive */
  P: number;
}

export interface LoadPoint {
  name: string;
  /** factored axial load, kip */
  Pu: number;
  /** first-order moment actually used, kip-in */
  firstOrder: number;
  /** magnified moment Mc, kip-in */
  magnified: number;
  /** false marks the point as failing */
  pass: boolean;
}

export interface InteractionChartProps {
  axis: "x" | "y";
  /** (Mn, Pn) from pure compression to pure tension */
  nominal: CurvePoint[];
  /** (φMn, φPn) from pure compression to pure tension */
  design: CurvePoint[];
  loads: LoadPoint[];
  units?: UnitSystem;
  title?: string;
  /** CSS height in pixels */
  height?: number;
}

const INK = "#333c46";
const OXIDE = "#9a4421";
const SOUND = "#2f6b4f";
const STRAINED = "#a8321f";

export function InteractionChart({ axis, nominal, design, loads, units = "US", title, height = 380 }: InteractionChartProps) {
  const mUnit = unitLabel("moment", units);
  const pUnit = unitLabel("force", units);
  const option = useMemo(() => {
    const M = (v: number) => toDisplay(v, "moment", units);
    const P = (v: number) => toDisplay(v, "force", units);
    const curve = (pts: CurvePoint[]) => pts.map((p) => [M(Math.max(0, p.M)), P(p.P)]);
    return {
      animation: false,
      title: title ? { text: title, left: 0, textStyle: { fontSize: 13, fontWeight: 600, color: INK } } : undefined,
      grid: { left: 64, right: 24, top: title ? 64 : 40, bottom: 44 },
      tooltip: {
        trigger: "item",
        formatter: (p: { seriesName: string; data: unknown; name?: string }) => {
          const d = p.data as { value?: number[]; name?: string } | number[];
          const v = Array.isArray(d) ? d : (d.value ?? []);
          const label = Array.isArray(d) ? p.seriesName : `${d.name ?? ""} — ${p.seriesName}`;
          return `${label}<br/>M = ${Number(v[0]).toFixed(1)} ${mUnit}<br/>P = ${Number(v[1]).toFixed(1)} ${pUnit}`;
        },
      },
      legend: { top: title ? 24 : 0, textStyle: { fontSize: 11 } },
      xAxis: { type: "value", name: `M${axis} (${mUnit})`, nameLocation: "middle", nameGap: 28, min: 0, splitLine: { lineStyle: { color: "#ece8dd" } } },
      yAxis: { type: "value", name: `P (${pUnit})`, nameLocation: "middle", nameGap: 48, splitLine: { lineStyle: { color: "#ece8dd" } } },
      series: [
        { name: "nominal (Mn, Pn)", type: "line", data: curve(nominal), showSymbol: false, lineStyle: { color: INK, type: "dashed", width: 1.5 }, itemStyle: { color: INK } },
        { name: "design (φMn, φPn)", type: "line", data: curve(design), showSymbol: false, lineStyle: { color: OXIDE, width: 2.5 }, itemStyle: { color: OXIDE } },
        {
          name: "first-order",
          type: "scatter",
          symbol: "emptyCircle",
          symbolSize: 9,
          itemStyle: { color: INK },
          data: loads.map((l) => ({ name: l.name, value: [M(l.firstOrder), P(l.Pu)] })),
        },
        {
          name: "magnified",
          type: "scatter",
          symbolSize: 11,
          data: loads.map((l) => ({
            name: l.name,
            value: [M(l.magnified), P(l.Pu)],
            symbol: l.pass ? "circle" : "path://M-1,-1L1,1M1,-1L-1,1",
            itemStyle: l.pass ? { color: SOUND } : { color: STRAINED, borderColor: STRAINED, borderWidth: 3 },
          })),
          markLine: {
            silent: true,
            symbol: ["none", "arrow"],
            symbolSize: 8,
            label: { show: false },
            lineStyle: { color: "#56606b", type: "solid", width: 1.2 },
            data: loads
              .filter((l) => Math.abs(l.magnified - l.firstOrder) > 1e-9)
              .map((l) => [{ coord: [M(l.firstOrder), P(l.Pu)] }, { coord: [M(l.magnified), P(l.Pu)] }]),
          },
        },
      ],
    };
  }, [axis, nominal, design, loads, units, title, mUnit, pUnit]);

  return (
    <figure className="break-inside-avoid" data-testid={`interaction-chart-${axis}`}>
      <div style={{ height }}>
        <ReactECharts option={option} style={{ height: "100%", width: "100%" }} opts={{ renderer: "svg" }} notMerge />
      </div>
      <figcaption className="mt-1 text-xs text-ink-700">
        <span className="sr-only">Load points about {axis}: </span>
        <ul className="space-y-0.5" aria-label={`Load points about ${axis}`}>
          {loads.map((l) => (
            <li key={l.name} data-testid="load-point" data-pass={l.pass ? "yes" : "no"}>
              <span className={l.pass ? "" : "font-semibold text-strained-600"}>{l.pass ? "○→●" : "○→✗"}</span> {l.name}: Pu {formatQuantity(l.Pu, "force", units)}, first-order {formatQuantity(l.firstOrder, "moment", units)} → magnified{" "}
              {formatQuantity(l.magnified, "moment", units)}
              {l.pass ? "" : " — fails"}
            </li>
          ))}
        </ul>
      </figcaption>
    </figure>
  );
}
