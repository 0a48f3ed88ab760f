"use client";
// Figure state: starts from the defaults, then the lesson's or the URL's initial values, and
// reports every change after it is committed (so the Bench can mirror it into the URL).
import { useCallback, useEffect, useRef, useState } from "react";

function definedEntries<State extends object>(partial: Partial<State> | undefined): Partial<State> {
  if (!partial) return {};
  return Object.fromEntries(Object.entries(partial).filter(([, value]) => value !== undefined)) as Partial<State>;
}

export function useFigureState<State extends object>(
  defaults: State,
  initialState: Partial<State> | undefined,
  onStateChange: ((state: State) => void) | undefined,
): [State, (patch: Partial<State>) => void] {
  const [state, setState] = useState<State>(() => ({ ...defaults, ...definedEntries(initialState) }));
  const reported = useRef(state);
  const listener = useRef(onStateChange);

  useEffect(() => {
    listener.current = onStateChange;
  }, [onStateChange]);

  useEffect(() => {
    // Identity check: the first commit (and StrictMode's second effect run) report nothing.
    if (reported.current === state) return;
    reported.current = state;
    listener.current?.(state);
  }, [state]);

  const update = useCallback((patch: Partial<State>) => setState((previous) => ({ ...previous, ...patch })), []);
  return [state, update];
}
