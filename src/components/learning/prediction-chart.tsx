"use client";
import { CartesianGrid, Legend, ReferenceLine, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from "recharts";

// Drawn only on /runs, loaded there with next/dynamic (prediction-chart-lazy.tsx). A point on the
// diagonal is a run whose strokes were predicted exactly.

export type PredictionChartProps = { points: Array<{ actual: number; table: number; learned: number | null }>; testId?: string };

export default function PredictionChart({ points, testId }: PredictionChartProps) {
  const table = points.map((p) => ({ x: p.actual, y: p.table }));
  const learned = points.filter((p) => p.learned !== null).map((p) => ({ x: p.actual, y: p.learned! }));
  const top = Math.max(1, ...points.flatMap((p) => [p.actual, p.table, p.learned ?? 0]));
  return (
    <figure data-testid={testId} className="w-full" aria-hidden="true">
      <div className="h-72 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <ScatterChart margin={{ top: 8, right: 16, bottom: 16, left: 8 }}>
            <CartesianGrid strokeDasharray="3 3" />
            <XAxis type="number" dataKey="x" name="strokes done" domain={[0, Math.ceil(top)]} label={{ value: "strokes done (double strokes)", position: "insideBottom", offset: -8 }} />
            <YAxis type="number" dataKey="y" name="predicted" domain={[0, Math.ceil(top)]} width={56} tickFormatter={(v: number) => v.toFixed(0)} />
            <Tooltip formatter={(v) => Number(v).toFixed(1)} />
            <Legend verticalAlign="top" />
            <ReferenceLine segment={[{ x: 0, y: 0 }, { x: top, y: top }]} stroke="#777" strokeDasharray="6 4" />
            <Scatter name="table alone" data={table} fill="#777" shape="cross" />
            <Scatter name="with learning" data={learned} fill="#b5651d" />
          </ScatterChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
