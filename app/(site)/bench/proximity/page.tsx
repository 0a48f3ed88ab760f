import { ProximityFigure } from "@/components/figures/proximity-figure";
import { BenchToolPage, benchToolMetadata } from "../_tool/bench-tool-page";

export const metadata = benchToolMetadata("proximity");

export default function Page() {
  return <BenchToolPage tool="proximity" figure={<ProximityFigure />} />;
}
