"use client";
// Difficulty (p) against discrimination (D) per item. Flagged items are triangles, the others
// circles, so the flag does not rest on colour alone (WCAG 1.4.1); guide lines at D = 0.20 and
// p = 0.95 mark the flag thresholds.
import { CartesianGrid, ReferenceLine, ResponsiveContainer, Scatter, ScatterChart, Tooltip, XAxis, YAxis } from "recharts";
import { ChartFrame } from "./chart-frame";

export type ScatterItem = { position: number; topic: string; p: number | null; d: number | null; flagged: boolean };

export function ItemScatter({ items }: { items: ScatterItem[] }) {
  const plotted = items.filter((i): i is ScatterItem & { p: number; d: number } => i.p !== null && i.d !== null);
  const flagged = plotted.filter((i) => i.flagged);
  const summary =
    plotted.length === 0
      ? "No item has enough attempts to plot yet."
      : `${plotted.length} items plotted by difficulty and discrimination; ${flagged.length} flagged (triangles): ${flagged.map((i) => `question ${i.position}`).join(", ") || "none"}.`;
  return (
    <ChartFrame
      title="Difficulty and discrimination of each item"
      summary={summary}
      legend={
        <p aria-hidden="true" className="flex flex-wrap gap-x-4 text-body-sm">
          <span>
            <span className="text-trace-2">●</span> Items without flags
          </span>
          <span>
            <span className="text-trace-4">▲</span> Flagged items
          </span>
        </p>
      }
    >
      <ResponsiveContainer width="100%" height="100%">
        <ScatterChart accessibilityLayer={false} margin={{ top: 16, right: 20, bottom: 30, left: 10 }}>
          <CartesianGrid stroke="var(--color-rule)" />
          <XAxis type="number" dataKey="p" name="Difficulty p" domain={[0, 1]} tickCount={6} stroke="var(--color-ink-muted)" label={{ value: "Difficulty p (share of points earned)", position: "insideBottom", offset: -18, fill: "var(--color-ink)" }} />
          <YAxis type="number" dataKey="d" name="Discrimination D" domain={[-1, 1]} tickCount={5} stroke="var(--color-ink-muted)" label={{ value: "Discrimination D", angle: -90, position: "insideLeft", fill: "var(--color-ink)" }} />
          <ReferenceLine y={0.2} stroke="var(--color-caution)" strokeDasharray="5 4" label={{ value: "D = 0.20", position: "insideTopRight", fill: "var(--color-ink)" }} />
          <ReferenceLine x={0.95} stroke="var(--color-caution)" strokeDasharray="5 4" />
          <Tooltip cursor={{ strokeDasharray: "3 3" }} formatter={(value) => (typeof value === "number" ? value.toFixed(2) : String(value))} />
          <Scatter name="Items without flags" data={plotted.filter((i) => !i.flagged)} fill="var(--color-trace-2)" shape="circle" isAnimationActive={false} />
          <Scatter name="Flagged items" data={flagged} fill="var(--color-trace-4)" shape="triangle" isAnimationActive={false} />
        </ScatterChart>
      </ResponsiveContainer>
    </ChartFrame>
  );
}
