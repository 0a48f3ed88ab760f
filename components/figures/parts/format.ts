// Text formatting for figure readouts. Rounding only: every number comes from lib/acoustics.

/** The typographic minus (U+2212), so negative readouts do not read as hyphens. */
const MINUS = "\u2212";

function withMinus(text: string): string {
  return text.startsWith("-") ? `${MINUS}${text.slice(1)}` : text;
}

/** A plain number with `digits` decimals and a real minus sign; "−0.0" becomes "0.0". */
export function formatNumber(value: number, digits = 1): string {
  const rounded = Number(value.toFixed(digits));
  return withMinus((Object.is(rounded, -0) ? 0 : rounded).toFixed(digits));
}

/**
 * A level in dB. −Infinity (an ideal null) reads "−∞ dB". `signed` adds "+" to positive values,
 * for changes and levels relative to on axis.
 */
export function formatDb(levelDb: number, { digits = 1, signed = false, unit = "dB" }: { digits?: number; signed?: boolean; unit?: string } = {}): string {
  if (levelDb === -Infinity) return `${MINUS}∞ ${unit}`;
  if (levelDb === Infinity) return `+∞ ${unit}`;
  const text = formatNumber(levelDb, digits);
  const plus = signed && Number(text.replace(MINUS, "-")) > 0 ? "+" : "";
  return `${plus}${text} ${unit}`;
}

/** A frequency: "86 Hz", "1.43 kHz", "12.9 kHz". */
export function formatFrequency(frequencyHz: number): string {
  if (frequencyHz >= 10_000) return `${formatNumber(frequencyHz / 1000, 1)} kHz`;
  if (frequencyHz >= 1000) return `${formatNumber(frequencyHz / 1000, 2)} kHz`;
  if (frequencyHz >= 100) return `${formatNumber(frequencyHz, 0)} Hz`;
  return `${formatNumber(frequencyHz, 1)} Hz`;
}

/** An impedance: "600 Ω", "1.5 kΩ", "216 kΩ", "1.2 MΩ". */
export function formatOhms(ohms: number): string {
  const compact = (value: number) => (value >= 100 ? formatNumber(value, 0) : value >= 10 ? formatNumber(value, 1).replace(/\.0$/, "") : formatNumber(value, 2).replace(/\.?0+$/, ""));
  if (ohms >= 1e6) return `${compact(ohms / 1e6)} MΩ`;
  if (ohms >= 1000) return `${compact(ohms / 1000)} kΩ`;
  return `${compact(ohms)} Ω`;
}

/** A duration given in hours: "2 h 30 min", "15 min", "56 s". */
export function formatHours(hours: number): string {
  if (!Number.isFinite(hours)) return "no limit";
  const totalSeconds = Math.round(hours * 3600);
  if (totalSeconds < 60) return `${totalSeconds} s`;
  const totalMinutes = Math.round(totalSeconds / 60);
  if (totalMinutes < 60) {
    const seconds = totalSeconds - Math.floor(totalSeconds / 60) * 60;
    return totalMinutes < 10 && seconds > 0 ? `${Math.floor(totalSeconds / 60)} min ${seconds} s` : `${totalMinutes} min`;
  }
  const wholeHours = Math.floor(totalMinutes / 60);
  const minutes = totalMinutes - wholeHours * 60;
  return minutes === 0 ? `${wholeHours} h` : `${wholeHours} h ${minutes} min`;
}

/** An angle in whole degrees, 0–359. */
export function formatDegrees(angleDeg: number, digits = 0): string {
  return `${formatNumber(angleDeg, digits)}°`;
}

/** Where an angle off the mic's axis points, in words, for text alternatives (0° = on axis, clockwise). */
export function describeBearing(angleDeg: number): string {
  const reduced = ((Math.round(angleDeg) % 360) + 360) % 360;
  if (reduced === 0) return "on axis";
  if (reduced === 180) return "directly behind";
  const side = reduced < 180 ? "right" : "left";
  const offAxis = reduced < 180 ? reduced : 360 - reduced;
  const zone = offAxis < 60 ? "front" : offAxis <= 120 ? "side" : "rear";
  return `${zone} ${side}`;
}
