import type { CourseLevel, SafetyTopic } from "@/lib/content/schemas";

/** 155 → "2 h 35 min"; 45 → "45 min". */
export function formatMinutes(minutes: number): string {
  const hours = Math.floor(minutes / 60);
  const rest = minutes % 60;
  if (hours === 0) return `${rest} min`;
  return rest === 0 ? `${hours} h` : `${hours} h ${rest} min`;
}

export const LEVEL_LABEL: Record<CourseLevel, string> = { foundation: "Foundation", intermediate: "Intermediate", advanced: "Advanced" };

export const SAFETY_LABEL: Record<SafetyTopic, string> = {
  hearing: "Hearing",
  electrical: "Electrical",
  "phantom-power": "Phantom power",
  "stands-overhead": "Stands and overhead loads",
  "cable-runs": "Cable runs",
  "manual-handling": "Manual handling",
  "work-at-height": "Ladders and work at height",
  "outdoor-weather": "Wind and weather outdoors",
};

export const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
