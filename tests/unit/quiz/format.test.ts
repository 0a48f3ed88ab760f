import { describe, expect, it } from "vitest";
import { clockInWords, formatClock, formatPercent, parseTypedNumber } from "@/components/quiz/format";

describe("quiz formatting", () => {
  it("reads typed numbers, with a decimal comma too, and refuses anything else", () => {
    expect(parseTypedNumber("2.9")).toBe(2.9);
    expect(parseTypedNumber(" 12,5 ")).toBe(12.5); // decimal comma, as typed in much of Europe // common practice
    expect(parseTypedNumber("-3")).toBe(-3);
    expect(parseTypedNumber(".5")).toBe(0.5);
    expect(parseTypedNumber("1e3")).toBe(1000);
    expect(parseTypedNumber("")).toBeNull();
    expect(parseTypedNumber("12 Hz")).toBeNull();
    expect(parseTypedNumber("1,000.5")).toBeNull();
    expect(parseTypedNumber("abc")).toBeNull();
  });

  it("writes the countdown and the score", () => {
    expect(formatClock(65)).toBe("1:05");
    expect(formatClock(3725)).toBe("1:02:05");
    expect(formatClock(-4)).toBe("0:00");
    expect(clockInWords(61)).toBe("1 minute 1 second");
    expect(clockInWords(300)).toBe("5 minutes");
    expect(formatPercent(75)).toBe("75 %");
    expect(formatPercent(72.54)).toBe("72.5 %");
  });
});
