"use client";

import {
  Bar,
  CartesianGrid,
  ComposedChart,
  Legend,
  Line,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";

// Worms (line, left axis) and castings forecast per month (bars, right axis),
// already in the garden's units; the table under it carries the same numbers
// for anyone who cannot read the chart.

export interface ForecastPoint {
  month: string;
  worms: number;
  castings: number;
}

export function BinForecastChart({ data, massUnit }: { data: ForecastPoint[]; massUnit: string }) {
  return (
    <div className="h-72 w-full" aria-hidden>
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart data={data} margin={{ top: 8, right: 8, bottom: 8, left: 8 }}>
          <CartesianGrid stroke="#e4d8c5" strokeDasharray="3 3" />
          <XAxis dataKey="month" tick={{ fontSize: 12 }} />
          <YAxis yAxisId="worms" tick={{ fontSize: 12 }} width={56} />
          <YAxis yAxisId="castings" orientation="right" tick={{ fontSize: 12 }} width={40} />
          <Tooltip />
          <Legend />
          <Bar
            yAxisId="castings"
            dataKey="castings"
            name={`Castings (${massUnit})`}
            fill="#8f7d68"
          />
          <Line
            yAxisId="worms"
            dataKey="worms"
            name="Worms"
            stroke="#2e6b3a"
            strokeWidth={3}
            dot={false}
            type="monotone"
          />
        </ComposedChart>
      </ResponsiveContainer>
    </div>
  );
}
