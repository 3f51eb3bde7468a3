"use client";
/** Total cost against the number of distinct outlines (ECharts); a click picks N. */
import dynamic from "next/dynamic";
import { useMemo } from "react";
import type { SweepEntry } from "./use-standardization";

const ReactECharts = dynamic(() => import("echarts-for-react"), { ssr: false, loading: () => <div className="h-72 animate-pulse bg-stone-50" /> });

export interface OutlineCostChartProps {
  sweep: SweepEntry[];
  selected: number;
  onSelect: (n: number) => void;
}

export function OutlineCostChart({ sweep, selected, onSelect }: OutlineCostChartProps) {
  const option = useMemo(
    () => ({
      animation: false,
      grid: { left: 80, right: 24, top: 24, bottom: 48 },
      tooltip: { trigger: "axis", valueFormatter: (v: number | null) => (v === null ? "no assignment" : `$${Math.round(v).toLocaleString("en-US")}`) },
      xAxis: { type: "category", name: "distinct outlines N", nameLocation: "middle", nameGap: 30, data: sweep.map((s) => String(s.maxOutlines)) },
      yAxis: { type: "value", name: "total cost ($)", scale: true, axisLabel: { formatter: (v: number) => `$${Math.round(v / 1000)}k` } },
      series: [
        {
          type: "line",
          name: "total cost",
          data: sweep.map((s) => ({
            value: s.feasible ? s.totalCost : null,
            symbolSize: s.maxOutlines === selected ? 14 : 8,
            itemStyle: { color: s.maxOutlines === selected ? "#9a4421" : "#56606b" },
          })),
          lineStyle: { color: "#56606b" },
          connectNulls: false,
        },
      ],
    }),
    [sweep, selected],
  );
  return (
    <div className="h-72" role="img" aria-label="Total cost against the number of distinct section outlines">
      <ReactECharts
        option={option}
        style={{ height: "100%" }}
        onEvents={{ click: (e: { dataIndex: number }) => onSelect((sweep[e.dataIndex]?.maxOutlines ?? selected)) }}
      />
    </div>
  );
}
