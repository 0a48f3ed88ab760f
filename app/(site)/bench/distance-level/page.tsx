import { DistanceLevelFigure } from "@/components/figures/distance-level-figure";
import { BenchToolPage, benchToolMetadata } from "../_tool/bench-tool-page";

export const metadata = benchToolMetadata("distance-level");

export default function Page() {
  return <BenchToolPage tool="distance-level" figure={<DistanceLevelFigure />} />;
}
