// Lengths and temperatures in the viewer's unit system. State is always SI (metres, °C);
// these convert for display and back with the library's exact conversions (NIST SP 811).
import { celsiusToFahrenheit, fahrenheitToCelsius, feetToMetres, metresToFeet } from "@/lib/acoustics";
import type { UnitSystem } from "../units-preference";
import { formatNumber } from "./format";

export function lengthUnit(system: UnitSystem): "m" | "ft" {
  return system === "imperial" ? "ft" : "m";
}

export function temperatureUnit(system: UnitSystem): "°C" | "°F" {
  return system === "imperial" ? "°F" : "°C";
}

export function lengthToDisplay(lengthM: number, system: UnitSystem): number {
  return system === "imperial" ? metresToFeet(lengthM) : lengthM;
}

export function lengthFromDisplay(value: number, system: UnitSystem): number {
  return system === "imperial" ? feetToMetres(value) : value;
}

export function temperatureToDisplay(temperatureC: number, system: UnitSystem): number {
  return system === "imperial" ? celsiusToFahrenheit(temperatureC) : temperatureC;
}

export function temperatureFromDisplay(value: number, system: UnitSystem): number {
  return system === "imperial" ? fahrenheitToCelsius(value) : value;
}

/** Decimals that keep about three significant figures for a length readout. */
function lengthDigits(value: number): number {
  const magnitude = Math.abs(value);
  if (magnitude >= 10) return 1;
  if (magnitude >= 1) return 2;
  if (magnitude >= 0.1) return 2;
  return 3;
}

/** "0.30 m" or "0.98 ft". */
export function formatLength(lengthM: number, system: UnitSystem, digits?: number): string {
  const value = lengthToDisplay(lengthM, system);
  return `${formatNumber(value, digits ?? lengthDigits(value))} ${lengthUnit(system)}`;
}

/** "20 °C" or "68 °F". */
export function formatTemperature(temperatureC: number, system: UnitSystem, digits = 0): string {
  return `${formatNumber(temperatureToDisplay(temperatureC, system), digits)} ${temperatureUnit(system)}`;
}
