import { TwoMicsFigure } from "@/components/figures/two-mics-figure";
import { BenchToolPage, benchToolMetadata } from "../_tool/bench-tool-page";

export const metadata = benchToolMetadata("two-mics");

export default function Page() {
  return <BenchToolPage tool="two-mics" figure={<TwoMicsFigure />} />;
}
