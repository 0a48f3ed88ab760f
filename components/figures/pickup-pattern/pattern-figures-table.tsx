// The pattern's figures of merit, all from lib/acoustics patternFigures (Eargle, ch. 5–6).
import type { PatternFigures } from "@/lib/acoustics";
import { formatDb, formatDegrees, formatNumber } from "../parts/format";
import { Readouts, type ReadoutItem } from "../parts/readouts";

function arcText(arcDeg: number): string {
  return arcDeg >= 360 ? "all round" : formatDegrees(arcDeg);
}

export function PatternFiguresList({ figures }: { figures: PatternFigures }) {
  const nulls = figures.nullAnglesDeg.length === 0 ? "none" : figures.nullAnglesDeg.map((angleDeg) => formatDegrees(angleDeg, 1)).join(", ");
  const items: ReadoutItem[] = [
    { label: "Directivity index", value: formatDb(figures.directivityIndexDb, { digits: 2 }), testId: "figure-di" },
    { label: "Random-energy efficiency", value: formatNumber(figures.randomEnergyEfficiency, 3), testId: "figure-ree" },
    { label: "Room pickup vs omni", value: formatDb(figures.ambientRejectionDb, { digits: 2 }), testId: "figure-ambient" },
    { label: "Distance factor", value: `${formatNumber(figures.distanceFactor, 2)}×`, testId: "figure-dsf" },
    { label: "Null angles", value: nulls, testId: "figure-nulls" },
    { label: "Level at 90°", value: formatDb(figures.level90Db, { digits: 2 }), testId: "figure-90" },
    {
      label: "Level at 180°",
      value: `${formatDb(figures.level180Db, { digits: 2 })}${figures.invertedAt180 ? " (inverted)" : ""}`,
      testId: "figure-180",
    },
    { label: "Front-to-back (random)", value: formatDb(figures.frontToBackHemiDb, { digits: 2 }), testId: "figure-fb" },
    { label: "Pickup arc, −3 dB", value: arcText(figures.pickupArc3DbDeg), testId: "figure-arc3" },
    { label: "Pickup arc, −6 dB", value: arcText(figures.pickupArc6DbDeg), testId: "figure-arc6" },
  ];
  return <Readouts items={items} label="Figures of merit" columns={2} />;
}
