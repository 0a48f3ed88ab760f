import { DirectBoxFigure } from "@/components/figures/direct-box-figure";
import { BenchToolPage, benchToolMetadata } from "../_tool/bench-tool-page";

export const metadata = benchToolMetadata("direct-box");

export default function Page() {
  return <BenchToolPage tool="direct-box" figure={<DirectBoxFigure />} />;
}
