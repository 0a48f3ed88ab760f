"use client";
// The app-wide metric/imperial preference: one small store in localStorage, read with
// useSyncExternalStore so every figure on the page (and other tabs) follows one toggle.
// Nothing touches `window` at import time: the server and the first hydration render use "metric".
import { useSyncExternalStore } from "react";
import { cx } from "@/components/ui/cx";

export type UnitSystem = "metric" | "imperial";

export const UNIT_SYSTEM_STORAGE_KEY = "axisline.unit-system";

const listeners = new Set<() => void>();
/** Used when localStorage is unavailable (private mode, blocked storage). */
let memorySystem: UnitSystem = "metric";

function readUnitSystem(): UnitSystem {
  try {
    const stored = window.localStorage.getItem(UNIT_SYSTEM_STORAGE_KEY);
    if (stored === "imperial" || stored === "metric") return stored;
  } catch {
    // storage blocked: fall through to the in-memory choice
  }
  return memorySystem;
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  const onStorage = (event: StorageEvent) => {
    if (event.key === UNIT_SYSTEM_STORAGE_KEY) listener();
  };
  window.addEventListener("storage", onStorage);
  return () => {
    listeners.delete(listener);
    window.removeEventListener("storage", onStorage);
  };
}

function serverSnapshot(): UnitSystem {
  return "metric";
}

export function setUnitSystem(system: UnitSystem): void {
  memorySystem = system;
  try {
    window.localStorage.setItem(UNIT_SYSTEM_STORAGE_KEY, system);
  } catch {
    // storage blocked: the in-memory choice still applies to this page
  }
  for (const listener of listeners) listener();
}

/** The viewer's unit system; "metric" on the server and until the client has read the preference. */
export function useUnitSystem(): UnitSystem {
  return useSyncExternalStore(subscribe, readUnitSystem, serverSnapshot);
}

const OPTIONS: ReadonlyArray<{ system: UnitSystem; label: string; detail: string }> = [
  { system: "metric", label: "Metric", detail: "metres, °C" },
  { system: "imperial", label: "Imperial", detail: "feet, °F" },
];

/** Two pressed/unpressed buttons; the choice applies to every figure on every page. */
export function UnitToggle({ className }: { className?: string }) {
  const current = useUnitSystem();
  return (
    <div role="group" aria-label="Units for lengths and temperatures" className={cx("inline-flex rounded-control border border-border", className)}>
      {OPTIONS.map((option, index) => {
        const pressed = current === option.system;
        return (
          <button
            key={option.system}
            type="button"
            aria-pressed={pressed}
            title={option.detail}
            onClick={() => setUnitSystem(option.system)}
            className={cx(
              "min-h-8 min-w-target px-3 text-body-sm font-semibold transition-colors",
              index === 0 ? "rounded-l-control" : "rounded-r-control border-l border-border",
              pressed ? "bg-accent text-accent-ink" : "bg-surface-raised text-ink hover:bg-surface-sunken",
            )}
          >
            {option.label}
            <span className="sr-only"> ({option.detail})</span>
          </button>
        );
      })}
    </div>
  );
}
