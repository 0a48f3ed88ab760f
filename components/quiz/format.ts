// Numbers and times as the quiz pages write them (client-safe, no dependencies).

/** "75 %" for whole numbers, "72.5 %" otherwise (partial credit gives fractions). */
export function formatPercent(percent: number): string {
  const rounded = Math.round(percent * 10) / 10;
  return `${Number.isInteger(rounded) ? rounded.toFixed(0) : rounded.toFixed(1)} %`;
}

/** "4:05" (minutes:seconds) or "1:02:05" past an hour, for the countdown. */
export function formatClock(totalSeconds: number): string {
  const s = Math.max(0, Math.ceil(totalSeconds));
  const hours = Math.floor(s / 3600);
  const minutes = Math.floor((s % 3600) / 60);
  const seconds = String(s % 60).padStart(2, "0");
  return hours > 0 ? `${hours}:${String(minutes).padStart(2, "0")}:${seconds}` : `${minutes}:${seconds}`;
}

/** "4 minutes 5 seconds", for screen readers and the warnings. */
export function clockInWords(totalSeconds: number): string {
  const s = Math.max(0, Math.ceil(totalSeconds));
  const minutes = Math.floor(s / 60);
  const seconds = s % 60;
  const parts: string[] = [];
  if (minutes > 0) parts.push(`${minutes} minute${minutes === 1 ? "" : "s"}`);
  if (seconds > 0 || minutes === 0) parts.push(`${seconds} second${seconds === 1 ? "" : "s"}`);
  return parts.join(" ");
}

const dateTime = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", timeZone: "UTC" });

/** "3 Mar 2027, 14:05 UTC": the same on server and browser, so hydration never differs. */
export function formatUtc(iso: string): string {
  return `${dateTime.format(new Date(iso))} UTC`;
}

/** Reads a typed number: "2.9", "2,9" (decimal comma), "-3", "1e3". null when it isn't one. */
export function parseTypedNumber(text: string): number | null {
  const trimmed = text.trim().replace(/\s/g, "");
  if (trimmed === "") return null;
  const normalised = /^-?\d+,\d+$/.test(trimmed) ? trimmed.replace(",", ".") : trimmed;
  if (!/^-?(\d+\.?\d*|\.\d+)(e-?\d+)?$/i.test(normalised)) return null;
  const value = Number(normalised);
  return Number.isFinite(value) ? value : null;
}
