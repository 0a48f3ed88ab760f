import { PickupPatternFigure } from "@/components/figures/pickup-pattern/pickup-pattern-figure";
import { BenchToolPage, benchToolMetadata } from "../_tool/bench-tool-page";

export const metadata = benchToolMetadata("pickup-pattern");

export default function Page() {
  return <BenchToolPage tool="pickup-pattern" figure={<PickupPatternFigure />} />;
}
