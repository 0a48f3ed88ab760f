// The accessible SVG shell shared by every drawing: role="img", <title> and <desc> joined by
// aria-labelledby, a viewBox that scales to the container width, then the drawing and the marks.
import type { ReactNode } from "react";
import type { DiagramFrame } from "./diagram-frame";
import { PositionMarks } from "./position-marks";

export interface DiagramSvgProps {
  readonly frame: DiagramFrame;
  /** The equipment drawing, behind the marks. */
  readonly children: ReactNode;
}

export function DiagramSvg({ frame, children }: DiagramSvgProps) {
  const { width, height } = frame.spec.viewBox;
  const titleId = `${frame.idPrefix}-title`;
  const descId = `${frame.idPrefix}-desc`;
  return (
    <svg
      xmlns="http://www.w3.org/2000/svg"
      viewBox={`0 0 ${width} ${height}`}
      width="100%"
      role="img"
      aria-labelledby={`${titleId} ${descId}`}
      data-diagram={frame.name}
      style={{ display: "block", width: "100%", height: "auto" }}
      fill="none"
      stroke="currentColor"
      strokeWidth={2}
      strokeLinecap="round"
      strokeLinejoin="round"
      fontFamily="inherit"
    >
      <title id={titleId}>{frame.spec.title}</title>
      <desc id={descId}>{frame.descriptionText}</desc>
      <g aria-hidden="true">{children}</g>
      <PositionMarks frame={frame} />
    </svg>
  );
}
