"use client";
/**
 * The search's trade-off as an ECharts scatter: cost ($ per column) against utilization, every
 * passing candidate in grey and the front (no other candidate is both cheaper and less utilized)
 * joined in the accent colour, with the mark's current design and the cheapest passing candidate
 * marked. A toggle switches to carbon (kgCO2e) against cost with the carbon front. Clicking a
 * point toggles it in the comparison; the candidate table is the keyboard route to the same.
 */
import dynamic from "next/dynamic";
import { useMemo } from "react";
import { formatNumber } from "@/components/projects/units";
import type { CandidateRow } from "./search-types";
import { formatCarbon, formatDollars } from "./candidate-format";

const ReactECharts = dynamic(() => import("echarts-for-react"), { ssr: false, loading: () => <div className="h-full animate-pulse bg-stone-50" /> });

export type FrontView = "cost" | "carbon";

export interface CurrentPoint {
  label: string;
  cost: number | null;
  carbon: number | null;
  utilization: number | null;
  pass: boolean;
}

export interface FrontChartProps {
  candidates: CandidateRow[];
  view: FrontView;
  onViewChange: (view: FrontView) => void;
  bestId: string | null;
  carbonFront: string[];
  current: CurrentPoint | null;
  selected: string[];
  onToggle: (id: string) => void;
  height?: number;
}

const INK = "#333c46";
const GREY = "#c3b9a2";
const OXIDE = "#9a4421";
const SOUND = "#2f6b4f";
const STRAINED = "#a8321f";

interface Datum {
  id: string;
  value: [number, number];
}

export function FrontChart({ candidates, view, onViewChange, bestId, carbonFront, current, selected, onToggle, height = 380 }: FrontChartProps) {
  const option = useMemo(() => {
    const carbonSet = new Set(carbonFront);
    const onFront = (c: CandidateRow) => (view === "cost" ? c.onFront : carbonSet.has(c.id));
    const point = (c: CandidateRow): Datum => ({ id: c.id, value: view === "cost" ? [c.utilization, c.cost] : [c.cost, c.carbon] });
    const others = candidates.filter((c) => !onFront(c)).map(point);
    const front = candidates
      .filter(onFront)
      .map(point)
      .sort((a, b) => a.value[0] - b.value[0] || a.value[1] - b.value[1]);
    const best = candidates.find((c) => c.id === bestId);
    const chosen = candidates.filter((c) => selected.includes(c.id)).map(point);
    const currentValue: [number, number] | null =
      current && (view === "cost" ? current.utilization !== null && current.cost !== null : current.cost !== null && current.carbon !== null)
        ? view === "cost"
          ? [current.utilization ?? 0, current.cost ?? 0]
          : [current.cost ?? 0, current.carbon ?? 0]
        : null;
    const xName = view === "cost" ? "utilization (demand ÷ capacity, governing case)" : "cost ($ per column)";
    const yName = view === "cost" ? "cost ($ per column)" : "embodied carbon (kgCO2e per column)";
    const describe = (id: string) => {
      const c = candidates.find((x) => x.id === id);
      if (!c) return id;
      return `${c.id}<br/>${formatDollars(c.cost, 2)} · utilization ${formatNumber(c.utilization, 3)} · ${formatCarbon(c.carbon)}`;
    };
    return {
      animation: false,
      grid: { left: 76, right: 24, top: 24, bottom: 64 },
      tooltip: {
        trigger: "item",
        formatter: (p: { seriesName: string; data: unknown }) => {
          const d = p.data as { id?: string; value?: number[] };
          if (d.id) return describe(d.id);
          return p.seriesName;
        },
      },
      legend: { bottom: 0, textStyle: { fontSize: 11 } },
      xAxis: {
        type: "value",
        name: xName,
        nameLocation: "middle",
        nameGap: 28,
        scale: true,
        splitLine: { lineStyle: { color: "#ece8dd" } },
        ...(view === "cost" ? { max: (v: { max: number }) => Math.max(1.05, Math.ceil(v.max * 20) / 20) } : {}),
      },
      yAxis: { type: "value", name: yName, nameLocation: "middle", nameGap: 58, scale: true, splitLine: { lineStyle: { color: "#ece8dd" } } },
      series: [
        { name: "other passing candidates", type: "scatter", symbolSize: 7, itemStyle: { color: GREY }, data: others },
        {
          name: view === "cost" ? "front (cost vs utilization)" : "front (carbon vs cost)",
          type: "line",
          symbol: "circle",
          symbolSize: 8,
          lineStyle: { color: OXIDE, width: 1.5 },
          itemStyle: { color: OXIDE },
          data: front,
        },
        ...(best
          ? [
              {
                name: "cheapest passing",
                type: "scatter",
                symbol: "diamond",
                symbolSize: 16,
                itemStyle: { color: SOUND, borderColor: "#fff", borderWidth: 1 },
                label: { show: true, position: "right", formatter: "cheapest", color: SOUND, fontSize: 11 },
                data: [point(best)],
              },
            ]
          : []),
        ...(currentValue && current
          ? [
              {
                name: `current design${current.pass ? "" : " (fails)"}`,
                type: "scatter",
                symbol: current.pass ? "rect" : "path://M-1,-1L1,1M1,-1L-1,1",
                symbolSize: 14,
                itemStyle: current.pass ? { color: INK } : { color: STRAINED, borderColor: STRAINED, borderWidth: 3 },
                label: { show: true, position: "right", formatter: "current", color: current.pass ? INK : STRAINED, fontSize: 11 },
                data: [{ id: "", value: currentValue }],
                ...(view === "cost"
                  ? { markLine: { silent: true, symbol: "none", label: { formatter: "utilization 1.0", color: STRAINED }, lineStyle: { color: STRAINED, type: "dashed" }, data: [{ xAxis: 1 }] } }
                  : {}),
              },
            ]
          : []),
        {
          name: "in the comparison",
          type: "scatter",
          symbol: "circle",
          symbolSize: 15,
          itemStyle: { color: "rgba(0,0,0,0)", borderColor: INK, borderWidth: 2 },
          data: chosen,
          z: 10,
        },
      ],
    };
  }, [candidates, view, bestId, carbonFront, current, selected]);

  const onEvents = useMemo(
    () => ({
      click: (e: { data?: { id?: string } }) => {
        if (e.data?.id) onToggle(e.data.id);
      },
    }),
    [onToggle],
  );

  return (
    <figure className="space-y-2" data-testid="front-chart">
      <div role="radiogroup" aria-label="Chart view" className="flex gap-2 text-sm">
        {(
          [
            ["cost", "Cost vs utilization"],
            ["carbon", "Carbon vs cost"],
          ] as const
        ).map(([v, label]) => (
          <button key={v} type="button" role="radio" aria-checked={view === v} className={view === v ? "btn-primary" : "btn-quiet"} onClick={() => onViewChange(v)}>
            {label}
          </button>
        ))}
      </div>
      <div style={{ height }}>
        <ReactECharts option={option} style={{ height: "100%", width: "100%" }} opts={{ renderer: "svg" }} notMerge onEvents={onEvents} />
      </div>
      <figcaption className="text-xs text-ink-700">
        {view === "cost"
          ? "Each point is a passing candidate: lower cost and lower utilization are both better; the front joins the candidates no other beats on both."
          : "Each point is a passing candidate: the front joins those no other beats on both cost and embodied carbon."}{" "}
        Click a point to add it to the comparison, or use the table below.
      </figcaption>
    </figure>
  );
}
