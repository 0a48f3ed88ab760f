"use client";
// How many attempts scored in each 10 % band; each bar carries its count as text.
import { Bar, BarChart, CartesianGrid, LabelList, ResponsiveContainer, XAxis, YAxis } from "recharts";
import { ChartFrame } from "./chart-frame";

export type HistogramBin = { label: string; count: number };

export function ScoreHistogram({ bins, passingPercent }: { bins: HistogramBin[]; passingPercent: number }) {
  const total = bins.reduce((sum, b) => sum + b.count, 0);
  const summary =
    total === 0 ? "No submitted attempts yet." : `Scores of ${total} attempts in bands of 10 %: ${bins.filter((b) => b.count > 0).map((b) => `${b.count} in ${b.label}`).join(", ")}. Pass mark ${passingPercent} %.`;
  return (
    <ChartFrame title="Score distribution" summary={summary}>
      <ResponsiveContainer width="100%" height="100%">
        <BarChart accessibilityLayer={false} data={bins} margin={{ top: 20, right: 10, bottom: 30, left: 0 }}>
          <CartesianGrid stroke="var(--color-rule)" vertical={false} />
          <XAxis dataKey="label" stroke="var(--color-ink-muted)" interval={0} angle={-35} textAnchor="end" height={50} tick={{ fontSize: 12 }} />
          <YAxis allowDecimals={false} stroke="var(--color-ink-muted)" label={{ value: "Attempts", angle: -90, position: "insideLeft", fill: "var(--color-ink)" }} />
          <Bar dataKey="count" name="Attempts" fill="var(--color-trace-1)" isAnimationActive={false}>
            <LabelList dataKey="count" position="top" fill="var(--color-ink)" />
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
