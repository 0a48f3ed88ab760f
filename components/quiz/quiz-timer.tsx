"use client";
// The countdown of a timed attempt. The server enforces the deadline; this only shows it, warns
// at 5 minutes and at 1 minute (role=status, WCAG 4.1.3) and asks the player to submit at zero.
import { useEffect, useRef, useSyncExternalStore } from "react";
import { clockInWords, formatClock } from "./format";

const WARNINGS_S = [300, 60] as const;

function subscribeToClock(notify: () => void) {
  const id = setInterval(notify, 500);
  return () => clearInterval(id);
}

/** Seconds left by the server's clock; null during server rendering (no hydration mismatch). */
function useSecondsLeft(deadlineAt: string, serverNow: string): number | null {
  // The browser's clock may be off; the offset to the server's is taken at the first reading.
  const offsetMs = useRef<number | null>(null);
  return useSyncExternalStore(
    subscribeToClock,
    () => {
      offsetMs.current ??= Date.parse(serverNow) - Date.now();
      return Math.max(0, Math.ceil((Date.parse(deadlineAt) - Date.now() - offsetMs.current) / 1000));
    },
    () => null,
  );
}

function warningFor(secondsLeft: number): string | null {
  if (secondsLeft <= 0) return "Time is up. Your saved answers are being submitted.";
  if (secondsLeft <= WARNINGS_S[1]) return "1 minute left. Your answers are saved as you go; the quiz is submitted when the time runs out.";
  if (secondsLeft <= WARNINGS_S[0]) return "5 minutes left. Your answers are saved as you go; the quiz is submitted when the time runs out.";
  return null;
}

export function QuizTimer({ deadlineAt, serverNow, onExpire }: { deadlineAt: string; serverNow: string; onExpire: () => void }) {
  const secondsLeft = useSecondsLeft(deadlineAt, serverNow);
  const expired = useRef(false);
  const warning = secondsLeft === null ? null : warningFor(secondsLeft);

  useEffect(() => {
    if (secondsLeft === 0 && !expired.current) {
      expired.current = true;
      onExpire();
    }
  }, [secondsLeft, onExpire]);

  const urgent = secondsLeft !== null && secondsLeft <= WARNINGS_S[0];
  return (
    <div className="flex flex-col gap-1">
      <p className="text-body-sm">
        <span className="font-semibold">Time left: </span>
        {/* The ticking number is not a live region: only the warnings below are announced. */}
        <span aria-hidden="true" className={urgent ? "font-mono font-bold text-caution tabular-nums" : "font-mono tabular-nums"}>
          {secondsLeft === null ? "…" : formatClock(secondsLeft)}
        </span>
        <span className="sr-only">{secondsLeft === null ? "being worked out" : clockInWords(secondsLeft)}</span>
      </p>
      <p role="status" className="text-body-sm font-semibold text-caution empty:hidden">
        {warning}
      </p>
    </div>
  );
}
