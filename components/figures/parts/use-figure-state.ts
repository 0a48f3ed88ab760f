"use client";
// Figure state: starts from the defaults, then the lesson's or the URL's initial values, and
// reports every change after it is committed (so the Bench can mirror it into the URL).
import { createContext, useCallback, useContext, useEffect, useRef, useState } from "react";

/**
 * How the Bench binds the figure it shows: the starting state read from a shared link and where
 * to report changes. A context rather than props because the Bench page renders the figure on
 * the server, inside the client component that owns the URL, and a server component cannot hand
 * a figure a callback. A figure's own props win over it.
 */
export type FigureBinding = { initialState?: object; onStateChange?: (state: never) => void };
export const FigureBindingContext = createContext<FigureBinding | null>(null);

function definedEntries<State extends object>(partial: Partial<State> | undefined): Partial<State> {
  if (!partial) return {};
  return Object.fromEntries(Object.entries(partial).filter(([, value]) => value !== undefined)) as Partial<State>;
}

export function useFigureState<State extends object>(
  defaults: State,
  initialState: Partial<State> | undefined,
  onStateChange: ((state: State) => void) | undefined,
): [State, (patch: Partial<State>) => void] {
  const binding = useContext(FigureBindingContext);
  const [state, setState] = useState<State>(() => ({
    ...defaults,
    ...definedEntries(binding?.initialState as Partial<State> | undefined),
    ...definedEntries(initialState),
  }));
  const reported = useRef(state);
  const report = onStateChange ?? (binding?.onStateChange as ((state: State) => void) | undefined);
  const listener = useRef(report);

  useEffect(() => {
    listener.current = report;
  }, [report]);

  useEffect(() => {
    // Identity check: the first commit (and StrictMode's second effect run) report nothing.
    if (reported.current === state) return;
    reported.current = state;
    listener.current?.(state);
  }, [state]);

  const update = useCallback((patch: Partial<State>) => setState((previous) => ({ ...previous, ...patch })), []);
  return [state, update];
}
