import { FeedbackMarginFigure } from "@/components/figures/feedback-margin-figure";
import { BenchToolPage, benchToolMetadata } from "../_tool/bench-tool-page";

export const metadata = benchToolMetadata("feedback-margin");

export default function Page() {
  return <BenchToolPage tool="feedback-margin" figure={<FeedbackMarginFigure />} />;
}
