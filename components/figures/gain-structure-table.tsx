// The chain as a table: each stage's level in dBu and dBFS side by side, its headroom and its
// signal-to-noise ratio. It is also the figure's full text alternative. Test ids carry the stage
// id so the e2e checks can compare a cell with the library.
import { cx } from "@/components/ui/cx";
import type { ChainPoint } from "./gain-structure-chain";
import { formatDb } from "./parts/format";

/** Cells carry numbers only (the unit is in the column head), so the table fits 320 px. */
const number = (value: number) => formatDb(value, { unit: "" }).trim();

function headroomText(point: ChainPoint) {
  if (!Number.isFinite(point.headroomDb)) {
    return (
      <>
        <span aria-hidden="true">—</span>
        <span className="sr-only">no clip point</span>
      </>
    );
  }
  // Negative headroom is the amount over the clip point; the word says so beside the colour.
  return point.clips ? (
    <>
      {number(point.headroomDb)}
      <span className="sr-only"> (clips)</span>
    </>
  ) : (
    number(point.headroomDb)
  );
}

export function GainStructureTable({ points }: { points: readonly ChainPoint[] }) {
  return (
    <div role="region" aria-label="Levels at each stage" tabIndex={0} className="max-w-full overflow-x-auto rounded-control focus-visible:outline-3 focus-visible:outline-focus">
      <table className="w-full border-collapse text-caption @md:text-body-sm" data-testid="gain-structure-table">
        <caption className="sr-only">Level, headroom and signal-to-noise at each stage of the chain</caption>
        <thead>
          <tr className="border-b border-border text-left text-caption text-ink-muted">
            <th scope="col" className="py-1 pr-1 font-semibold">
              Stage
            </th>
            <th scope="col" className="py-1 pr-1 text-right font-semibold">
              <span className="block">Level</span>dBu
            </th>
            <th scope="col" className="py-1 pr-1 text-right font-semibold">
              <span className="block">Level</span>dBFS
            </th>
            <th scope="col" className="py-1 pr-1 text-right font-semibold">
              <span className="block">{"Head\u00ADroom"}</span>dB
            </th>
            <th scope="col" className="py-1 text-right font-semibold">
              <span className="block">S/N</span>dB
            </th>
          </tr>
        </thead>
        <tbody>
          {points.map((point) => (
            <tr key={point.id} className="border-b border-rule">
              <th scope="row" className="py-1.5 pr-1 text-left font-normal text-ink">
                {point.label}
              </th>
              <td data-testid={`level-dbu-${point.id}`} className="py-1.5 pr-1 text-right font-mono whitespace-nowrap">
                {number(point.levelDbu)}
              </td>
              <td data-testid={`level-dbfs-${point.id}`} className="py-1.5 pr-1 text-right font-mono whitespace-nowrap">
                {number(point.levelDbfs)}
              </td>
              <td data-testid={`headroom-${point.id}`} className={cx("py-1.5 pr-1 text-right font-mono font-semibold whitespace-nowrap", point.clips ? "text-danger" : "text-ink")}>
                {headroomText(point)}
              </td>
              <td data-testid={`snr-${point.id}`} className="py-1.5 text-right font-mono whitespace-nowrap">
                {Number.isFinite(point.snrDb) ? number(point.snrDb) : "no noise"}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
