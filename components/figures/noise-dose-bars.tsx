// Each standard's dose as a bar against the 100 % line (the whole day's allowance), and the
// results table (dose, TWA, time left) with test ids for the e2e checks.
import { cx } from "@/components/ui/cx";
import { formatDb, formatHours, formatNumber } from "./parts/format";

export interface DoseResult {
  id: string;
  label: string;
  dosePercent: number;
  twaDba: number;
  remainingHours: number;
}

export function leftText(hours: number): string {
  return hours <= 0 ? "none" : formatHours(hours);
}

function twaText(twaDba: number): string {
  return twaDba === -Infinity ? "no exposure" : formatDb(twaDba, { unit: "dBA" });
}

export function DoseResults({ results, nextLevelDba }: { results: readonly DoseResult[]; nextLevelDba: number }) {
  const rows = [
    { label: "Dose", cell: (result: DoseResult) => `${formatNumber(result.dosePercent, 1)} %`, testId: "dose", warn: (result: DoseResult) => result.dosePercent > 100 },
    { label: "8-hour TWA", cell: (result: DoseResult) => twaText(result.twaDba), testId: "twa", warn: () => false },
    { label: `Time left at ${formatNumber(nextLevelDba, 0)} dBA`, cell: (result: DoseResult) => leftText(result.remainingHours), testId: "time-left", warn: (result: DoseResult) => result.remainingHours <= 0 },
  ];
  return (
    <table className="w-full border-collapse text-body-sm">
      <caption className="sr-only">Dose, TWA and time left under each standard</caption>
      <thead>
        <tr className="border-b border-border text-left text-caption text-ink-muted">
          <td />
          {results.map((result) => (
            <th key={result.id} scope="col" className="py-1 text-right font-semibold">
              {result.label}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => (
          <tr key={row.testId} className="border-b border-rule">
            <th scope="row" className="py-1.5 pr-2 text-left font-normal text-ink-muted">
              {row.label}
            </th>
            {results.map((result) => (
              <td key={result.id} data-testid={`${row.testId}-${result.id}`} className={cx("py-1.5 text-right font-mono font-semibold", row.warn(result) ? "text-danger" : "text-ink")}>
                {row.cell(result)}
                {row.warn(result) && <span className="sr-only"> (over the limit)</span>}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

export function DoseBars({ results, description }: { results: readonly { label: string; dosePercent: number }[]; description: string }) {
  const scaleMaxPercent = Math.max(200, Math.ceil(Math.max(...results.map((result) => result.dosePercent)) / 100) * 100);
  const left = 92;
  const right = 466;
  const x = (percent: number) => left + ((right - left) * Math.min(percent, scaleMaxPercent)) / scaleMaxPercent;
  return (
    <svg viewBox={`0 0 480 ${results.length * 40 + 30}`} role="img" aria-label={description} className="block h-auto w-full text-ink" fontFamily="inherit" data-testid="dose-bars">
      <g aria-hidden="true">
        {results.map((result, index) => {
          const y = 8 + index * 40;
          const over = result.dosePercent > 100;
          return (
            <g key={result.label}>
              <text x={left - 8} y={y + 19} fontSize={16} textAnchor="end" fill="currentColor" fontWeight={700}>
                {result.label}
              </text>
              <rect x={left} y={y} width={right - left} height={26} fill="currentColor" fillOpacity={0.06} rx={3} />
              <rect x={left} y={y} width={x(result.dosePercent) - left} height={26} fill={over ? "var(--color-danger, currentColor)" : "var(--color-trace-3, currentColor)"} rx={3} />
              <text
                x={Math.min(x(result.dosePercent) + 6, right - 4)}
                y={y + 18}
                fontSize={16}
                textAnchor={x(result.dosePercent) + 60 > right ? "end" : "start"}
                fill="currentColor"
                fontWeight={700}
                paintOrder="stroke"
                stroke="var(--color-surface-raised, white)"
                strokeWidth={4}
              >
                {`${formatNumber(result.dosePercent, 0)} %`}
              </text>
            </g>
          );
        })}
        <line x1={x(100)} x2={x(100)} y1={2} y2={results.length * 40 + 8} stroke="currentColor" strokeWidth={2} strokeDasharray="4 3" />
        <text x={x(100)} y={results.length * 40 + 24} fontSize={14} textAnchor="middle" fill="var(--color-ink-muted, currentColor)">
          100 % (the day&apos;s limit)
        </text>
      </g>
    </svg>
  );
}
