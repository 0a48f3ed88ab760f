"use client";
// A number input that lets the viewer type freely and commits only valid values within bounds.
import { useState } from "react";
import { controlClassName } from "@/components/ui/control-styles";
import { cx } from "@/components/ui/cx";

export interface NumberFieldProps {
  id: string;
  value: number;
  min: number;
  max: number;
  step: number;
  onChange: (value: number) => void;
  "aria-label"?: string;
  "aria-labelledby"?: string;
  testId?: string;
  className?: string;
}

export function NumberField({ id, value, min, max, step, onChange, testId, className, ...aria }: NumberFieldProps) {
  const [draft, setDraft] = useState<string | null>(null);
  const parsed = draft === null ? value : Number(draft);
  const invalid = draft !== null && (draft.trim() === "" || !Number.isFinite(parsed) || parsed < min || parsed > max);
  return (
    <input
      id={id}
      type="number"
      inputMode="decimal"
      min={min}
      max={max}
      step={step}
      value={draft ?? String(value)}
      aria-invalid={invalid || undefined}
      data-testid={testId}
      onChange={(event) => {
        const text = event.currentTarget.value;
        setDraft(text);
        const next = Number(text);
        if (text.trim() !== "" && Number.isFinite(next) && next >= min && next <= max) onChange(next);
      }}
      onBlur={() => setDraft(null)}
      className={controlClassName(cx("min-h-control-sm px-2 py-1 font-mono", className))}
      {...aria}
    />
  );
}
