"use client";
// Length and temperature sliders that show the viewer's units and hand back SI values.
import type { ReactNode } from "react";
import type { UnitSystem } from "../units-preference";
import { formatLength, formatTemperature, lengthFromDisplay, lengthToDisplay, temperatureFromDisplay, temperatureToDisplay } from "./display-units";
import { RangeField, roundSeries, SeriesRangeField } from "./range-field";

export interface LengthFieldProps {
  label: ReactNode;
  lengthM: number;
  minM: number;
  maxM: number;
  system: UnitSystem;
  onChange: (lengthM: number) => void;
  hint?: ReactNode;
  testId?: string;
}

/** A distance slider over round values in metres or feet. */
export function LengthField({ label, lengthM, minM, maxM, system, onChange, hint, testId }: LengthFieldProps) {
  const min = lengthToDisplay(minM, system);
  const max = lengthToDisplay(maxM, system);
  // Round the ends in feet so the series starts and ends on readable values.
  const series = roundSeries(Number(min.toPrecision(2)), Number(max.toPrecision(2)));
  return (
    <SeriesRangeField
      label={label}
      series={series}
      value={lengthToDisplay(lengthM, system)}
      valueText={formatLength(lengthM, system)}
      onChange={(value) => onChange(lengthFromDisplay(value, system))}
      hint={hint}
      testId={testId}
    />
  );
}

export interface TemperatureFieldProps {
  temperatureC: number;
  system: UnitSystem;
  onChange: (temperatureC: number) => void;
}

/** Air temperature, −10 to 40 °C (14 to 104 °F), in whole degrees of the viewer's scale. */
export function TemperatureField({ temperatureC, system, onChange }: TemperatureFieldProps) {
  const min = Math.round(temperatureToDisplay(-10, system));
  const max = Math.round(temperatureToDisplay(40, system));
  return (
    <RangeField
      label="Air temperature"
      min={min}
      max={max}
      step={1}
      value={temperatureToDisplay(temperatureC, system)}
      valueText={formatTemperature(temperatureC, system)}
      onChange={(value) => onChange(temperatureFromDisplay(value, system))}
      hint="Sets the speed of sound."
    />
  );
}
