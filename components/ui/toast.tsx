"use client";

import * as ToastPrimitive from "@radix-ui/react-toast";
import { createContext, useCallback, useContext, useEffect, useRef, useState, type ReactNode } from "react";
import { Button, type ButtonProps } from "./button";
import { cx } from "./cx";
import { AlertIcon, CautionIcon, CheckIcon, CloseIcon, InfoIcon } from "./icons";

/* Radix Toast supplies the live-region announcement (polite for background, assertive for
   foreground), pause on hover/focus/window blur, swipe and Escape to dismiss, and F8 to reach
   the viewport. Toasts are for confirmations; anything the user must act on belongs on the page. */

export type ToastTone = "neutral" | "success" | "caution" | "danger";

export type ToastInput = {
  title: string;
  description?: string;
  tone?: ToastTone;
  /** Milliseconds on screen; danger toasts stay until dismissed (WCAG 2.2.1 Timing Adjustable). */
  durationMs?: number;
};

type ToastEntry = ToastInput & { id: number; open: boolean };

/** Long enough to read a two-line message; the timer pauses while hovered or focused. */
const defaultDurationMs = 7000;

const toneStyles: Record<ToastTone, { Icon: typeof InfoIcon; edge: string; ink: string; word: string }> = {
  neutral: { Icon: InfoIcon, edge: "border-l-note", ink: "text-note", word: "Note" },
  success: { Icon: CheckIcon, edge: "border-l-success", ink: "text-success", word: "Done" },
  caution: { Icon: CautionIcon, edge: "border-l-caution", ink: "text-caution", word: "Caution" },
  danger: { Icon: AlertIcon, edge: "border-l-danger", ink: "text-danger", word: "Error" },
};

type ShowToast = (toast: ToastInput) => void;

const ToastContext = createContext<ShowToast | null>(null);

/** Mount once near the root (the lead's layout); provides useToast() to everything inside. */
export function Toaster({ children }: { children: ReactNode }) {
  const [entries, setEntries] = useState<readonly ToastEntry[]>([]);
  const nextId = useRef(1);

  const show = useCallback<ShowToast>((toast) => {
    const id = nextId.current++;
    setEntries((current) => [...current, { ...toast, id, open: true }]);
  }, []);

  function close(id: number) {
    // Mark closed first so Radix can play the exit animation, then drop it.
    setEntries((current) => current.map((entry) => (entry.id === id ? { ...entry, open: false } : entry)));
    window.setTimeout(() => setEntries((current) => current.filter((entry) => entry.id !== id)), 300);
  }

  return (
    <ToastContext.Provider value={show}>
      <ToastPrimitive.Provider duration={defaultDurationMs} swipeDirection="right" label="Notifications">
        {children}
        {entries.map((entry) => (
          <ToastCard key={entry.id} entry={entry} onClose={() => close(entry.id)} />
        ))}
        <ToastPrimitive.Viewport
          data-print="hidden"
          className="fixed right-0 bottom-0 z-[60] m-0 flex w-full max-w-[26rem] list-none flex-col gap-3 p-4 outline-none"
        />
      </ToastPrimitive.Provider>
    </ToastContext.Provider>
  );
}

function ToastCard({ entry, onClose }: { entry: ToastEntry; onClose: () => void }) {
  const tone = entry.tone ?? "neutral";
  const { Icon, edge, ink, word } = toneStyles[tone];
  const isDanger = tone === "danger";
  return (
    <ToastPrimitive.Root
      open={entry.open}
      onOpenChange={(open) => !open && onClose()}
      type={isDanger ? "foreground" : "background"}
      duration={isDanger ? Infinity : (entry.durationMs ?? defaultDurationMs)}
      className={cx(
        "flex items-start gap-3 rounded-card border border-l-4 border-rule bg-surface-raised p-4 text-ink shadow-overlay",
        "data-[state=open]:animate-toast-in data-[state=closed]:animate-toast-out",
        "data-[swipe=move]:translate-x-[var(--radix-toast-swipe-move-x)] data-[swipe=cancel]:translate-x-0",
        "data-[swipe=end]:animate-toast-out",
        edge,
      )}
    >
      <Icon className={cx("mt-0.5", ink)} />
      <div className="flex min-w-0 flex-1 flex-col gap-0.5">
        <ToastPrimitive.Title className="text-body font-semibold">
          <span className="sr-only">{word}: </span>
          {entry.title}
        </ToastPrimitive.Title>
        {entry.description && (
          <ToastPrimitive.Description className="text-body-sm text-ink-muted">{entry.description}</ToastPrimitive.Description>
        )}
      </div>
      <ToastPrimitive.Close
        aria-label="Dismiss"
        className="-mt-1 -mr-1 inline-grid size-8 shrink-0 place-items-center rounded-control text-ink-muted hover:bg-surface-sunken hover:text-ink"
      >
        <CloseIcon />
      </ToastPrimitive.Close>
    </ToastPrimitive.Root>
  );
}

/** `const { toast } = useToast(); toast({ title: "Review saved", tone: "success" })`. */
export function useToast(): { toast: ShowToast } {
  const show = useContext(ToastContext);
  if (!show) throw new Error("useToast() needs a <Toaster> above it in the tree.");
  return { toast: show };
}

/**
 * Raises a toast once when rendered: lets a server component confirm what a server action did,
 * e.g. `{state.ok && <ShowToast title="Placement sent for review" tone="success" />}`.
 */
export function ShowToast(props: ToastInput) {
  const { toast } = useToast();
  const shown = useRef(false);
  useEffect(() => {
    if (shown.current) return;
    shown.current = true;
    toast(props);
  }, [toast, props]);
  return null;
}

export type ToastButtonProps = Omit<ButtonProps, "onClick"> & { toast: ToastInput };

/** A button that raises a toast when pressed (demos, "copied" confirmations). */
export function ToastButton({ toast: toastInput, ...props }: ToastButtonProps) {
  const { toast } = useToast();
  return <Button {...props} onClick={() => toast(toastInput)} />;
}
