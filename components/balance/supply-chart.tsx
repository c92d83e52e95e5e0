"use client";

import { useState } from "react";
import {
  Bar,
  BarChart,
  CartesianGrid,
  Legend,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import { cn } from "@/components/ui";
import type { MonthRow, PoolName } from "@/lib/engine";
import { columnUnit, toColumnValue } from "@/lib/format-quantity";
import { unitLabel } from "@/lib/units";
import type { UnitSystem } from "@/lib/units";
import { formatDay } from "@/lib/format";
import { palette } from "@/tailwind.config";

// Supply against demand per month: what was on hand (carried in + harvested)
// beside what the plantings wanted, with the part that could not be fed in red.

const series = [
  { key: "available", name: "On hand + made", color: palette.leaf[700] },
  { key: "wanted", name: "Wanted", color: palette.frost[700] },
  { key: "short", name: "Short", color: palette.bloom[700] },
] as const;

export function SupplyChart({ rows, system }: { rows: MonthRow[]; system: UnitSystem }) {
  const [pool, setPool] = useState<PoolName>("castings");
  const kind = pool === "castings" ? "castings-mass" : "liquid";
  const unit = unitLabel(columnUnit(kind, system));
  const data = rows
    .filter((r) => r.pool === pool)
    .map((r) => ({
      month: formatDay(`${r.month}-01`, { month: "short" }),
      available: toColumnValue(r.opening + r.supplied, kind, system),
      wanted: toColumnValue(r.demand, kind, system),
      short: toColumnValue(r.shortfall, kind, system),
    }));
  return (
    <section aria-labelledby="supply-chart-heading" className="flex min-w-0 flex-col gap-2">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="supply-chart-heading" className="text-xl">
          Supply against demand ({unit})
        </h2>
        <div role="group" aria-label="Material" className="flex gap-1">
          {(["castings", "leachate"] as const).map((p) => (
            <button
              key={p}
              type="button"
              aria-pressed={pool === p}
              onClick={() => setPool(p)}
              className={cn(
                "min-h-11 rounded-control border px-3 text-sm font-semibold",
                pool === p
                  ? "border-leaf-700 bg-leaf-700 text-white"
                  : "border-loam-400 bg-white text-soil-900",
              )}
            >
              {p === "castings" ? "Castings" : "Leachate"}
            </button>
          ))}
        </div>
      </div>
      <div
        className="h-64 w-full rounded-card border border-loam-200 bg-white p-2"
        aria-hidden="true"
      >
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={data} margin={{ top: 8, right: 8, bottom: 0, left: -16 }}>
            <CartesianGrid strokeDasharray="3 3" stroke={palette.loam[200]} vertical={false} />
            <XAxis
              dataKey="month"
              tick={{ fill: palette.soil[700], fontSize: 12 }}
              interval="preserveStartEnd"
            />
            <YAxis tick={{ fill: palette.soil[700], fontSize: 12 }} allowDecimals={false} />
            <Tooltip formatter={(value) => `${String(value)} ${unit}`} />
            <Legend wrapperStyle={{ fontSize: 13 }} />
            {series.map((s) => (
              <Bar key={s.key} dataKey={s.key} name={s.name} fill={s.color} radius={[3, 3, 0, 0]} />
            ))}
          </BarChart>
        </ResponsiveContainer>
      </div>
      <p className="text-sm text-soil-700">
        Green is what was on the shelf plus what the bins made that month; blue is what the
        plantings wanted; red is what could not be fed. The table below has every figure.
      </p>
    </section>
  );
}
