/**
 * Unit conversions (NIST SP 811: 1 ft = 0.3048 m exactly; °F = °C·9/5 + 32).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { celsiusToFahrenheit, celsiusToKelvin, fahrenheitToCelsius, feetToMetres, metresToFeet } from "@/lib/acoustics";
import { expectPrinted } from "./near";

describe("lengths", () => {
  it("1 ft = 0.3048 m exactly; 1 m = 3.28084 ft", () => {
    expect(feetToMetres(1)).toBe(0.3048); // NIST SP 811, appendix B (exact)
    expectPrinted(metresToFeet(1), "3.28084"); // NIST SP 811 [derived]
    expect(feetToMetres(-2)).toBe(-0.6096); // a signed offset converts too
  });

  it("property: round trip", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (lengthM) => {
        expect(feetToMetres(metresToFeet(lengthM))).toBeCloseTo(lengthM, 6);
      }),
    );
  });

  it("throws for non-finite input", () => {
    expect(() => metresToFeet(Number.NaN)).toThrow(RangeError);
    expect(() => feetToMetres(Number.POSITIVE_INFINITY)).toThrow(RangeError);
  });
});

describe("temperatures", () => {
  it("fixed points", () => {
    expect(celsiusToFahrenheit(0)).toBe(32); // NIST SP 811
    expect(celsiusToFahrenheit(100)).toBe(212); // NIST SP 811
    expect(celsiusToFahrenheit(-40)).toBe(-40); // the two scales cross at −40
    expectPrinted(celsiusToFahrenheit(20), "68"); // room temperature, common practice
    expect(fahrenheitToCelsius(212)).toBe(100);
    expect(celsiusToKelvin(20)).toBeCloseTo(293.15, 12); // ISO 80000-5
  });

  it("property: round trip", () => {
    fc.assert(
      fc.property(fc.double({ min: -273, max: 5000, noNaN: true }), (temperatureC) => {
        expect(fahrenheitToCelsius(celsiusToFahrenheit(temperatureC))).toBeCloseTo(temperatureC, 9);
      }),
    );
  });

  it("throws below absolute zero", () => {
    expect(() => celsiusToFahrenheit(-274)).toThrow(RangeError);
    expect(() => fahrenheitToCelsius(-460)).toThrow(/absolute zero/);
    expect(() => celsiusToKelvin(-300)).toThrow(RangeError);
  });
});
