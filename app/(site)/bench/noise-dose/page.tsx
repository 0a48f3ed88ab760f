import { NoiseDoseFigure } from "@/components/figures/noise-dose-figure";
import { BenchToolPage, benchToolMetadata } from "../_tool/bench-tool-page";

export const metadata = benchToolMetadata("noise-dose");

export default function Page() {
  return <BenchToolPage tool="noise-dose" figure={<NoiseDoseFigure />} />;
}
