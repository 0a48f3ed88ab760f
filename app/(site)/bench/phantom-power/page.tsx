import { PhantomPowerFigure } from "@/components/figures/phantom-power-figure";
import { BenchToolPage, benchToolMetadata } from "../_tool/bench-tool-page";

export const metadata = benchToolMetadata("phantom-power");

export default function Page() {
  return <BenchToolPage tool="phantom-power" figure={<PhantomPowerFigure />} />;
}
