// The size of each drawing a hotspot question can be asked on, in its viewBox units: the server
// keeps a clicked point inside the picture with it. The drawings live in components/diagrams, so
// the autosave route hands this to lib/server (which never imports components).
import { DIAGRAMS, isDiagramName } from "@/components/diagrams/registry";
import type { ImageBounds } from "@/lib/assessment";

export function diagramBounds(diagram: string): ImageBounds | undefined {
  if (!isDiagramName(diagram)) return undefined;
  const { width, height } = DIAGRAMS[diagram].viewBox;
  return { width, height };
}
