import { GainStructureFigure } from "@/components/figures/gain-structure-figure";
import { BenchToolPage, benchToolMetadata } from "../_tool/bench-tool-page";

export const metadata = benchToolMetadata("gain-structure");

export default function Page() {
  return <BenchToolPage tool="gain-structure" figure={<GainStructureFigure />} />;
}
