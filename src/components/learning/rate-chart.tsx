"use client";
import { CartesianGrid, Legend, Line, ComposedChart, ReferenceLine, ResponsiveContainer, Scatter, Tooltip, XAxis, YAxis } from "recharts";
import { dateText } from "@/shared/time";

// Drawn only on the stone page, loaded there with next/dynamic (rate-chart-lazy.tsx): recharts stays
// out of every other page's bundle.

export type RateChartProps = {
  points: Array<{ at: string; observedUm: number; current: boolean }>;
  tableRateUm: number;
  learnedRateUm: number | null;
  testId?: string;
  timeZone: string;
};

export default function RateChart({ points, tableRateUm, learnedRateUm, testId, timeZone }: RateChartProps) {
  const day = (ms: number) => dateText(ms, timeZone);
  const data = points.map((p) => ({ t: Date.parse(p.at), observed: p.observedUm, current: p.current }));
  return (
    <figure data-testid={testId} className="w-full">
      <div className="h-64 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={data} margin={{ top: 8, right: 16, bottom: 8, left: 8 }}>
            <CartesianGrid strokeDasharray="3 3" />
            <XAxis dataKey="t" type="number" scale="time" domain={["dataMin", "dataMax"]} tickFormatter={day} />
            <YAxis unit=" µm" width={72} domain={["auto", "auto"]} tickFormatter={(v: number) => v.toFixed(2)} />
            <Tooltip labelFormatter={(v) => day(Number(v))} formatter={(v) => [`${Number(v).toFixed(3)} µm`, "observed"]} />
            <Legend />
            <Scatter name="observed rate per run" dataKey="observed" fill="#2f5d8a" />
            <ReferenceLine y={tableRateUm} ifOverflow="extendDomain" stroke="#777" strokeDasharray="6 4" label={{ value: "table", position: "insideTopLeft" }} />
            {learnedRateUm !== null ? <ReferenceLine y={learnedRateUm} ifOverflow="extendDomain" stroke="#b5651d" label={{ value: "learned", position: "insideBottomLeft" }} /> : null}
            <Line dataKey="observed" stroke="none" dot={false} legendType="none" isAnimationActive={false} />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="text-caption text-ink-soft">
        Each dot is one logged run: what it removed per double stroke, brought back to the rate row&apos;s reference conditions (µm on the diameter). Dashed: the table. Solid: the learned rate.
      </figcaption>
    </figure>
  );
}
