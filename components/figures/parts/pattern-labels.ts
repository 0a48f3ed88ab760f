import type { PickupPatternId } from "@/lib/acoustics";

/** Short names for the pattern buttons (the library's labels are longer). */
export const PATTERN_SHORT_LABELS: Record<PickupPatternId, string> = {
  omni: "Omni",
  subcardioid: "Subcardioid",
  cardioid: "Cardioid",
  supercardioid: "Supercardioid",
  hypercardioid: "Hypercardioid",
  figure8: "Figure-8",
};
