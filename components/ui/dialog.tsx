"use client";

import * as DialogPrimitive from "@radix-ui/react-dialog";
import type { ComponentProps, ReactNode } from "react";
import { cx } from "./cx";
import { CloseIcon } from "./icons";

/* Radix Dialog supplies the modal pattern: focus moves in and is trapped, Escape closes,
   focus returns to the trigger, the rest of the page is inert to screen readers. */

export const Dialog = DialogPrimitive.Root;
/** Use `asChild` with a Button so the trigger is our button. */
export const DialogTrigger = DialogPrimitive.Trigger;
export const DialogClose = DialogPrimitive.Close;

export type DialogContentProps = Omit<ComponentProps<typeof DialogPrimitive.Content>, "title"> & {
  /** Required: the dialog's accessible name and visible heading. */
  title: ReactNode;
  description?: ReactNode;
};

export function DialogContent({ title, description, className, children, ...props }: DialogContentProps) {
  return (
    <DialogPrimitive.Portal>
      <DialogPrimitive.Overlay className="fixed inset-0 z-40 bg-[rgb(11_10_15/0.6)] data-[state=closed]:animate-overlay-out data-[state=open]:animate-overlay-in" />
      <DialogPrimitive.Content
        // Without a description, say so explicitly (Radix otherwise warns about a missing one).
        {...(description ? {} : { "aria-describedby": undefined })}
        className={cx(
          "fixed top-1/2 left-1/2 z-50 flex max-h-[calc(100dvh-2rem)] w-[min(calc(100vw-2rem),34rem)]",
          "-translate-x-1/2 -translate-y-1/2 flex-col gap-4 overflow-y-auto",
          "rounded-card border border-rule bg-surface-raised p-6 text-ink shadow-overlay",
          "data-[state=closed]:animate-dialog-out data-[state=open]:animate-dialog-in",
          className,
        )}
        {...props}
      >
        <div className="flex items-start justify-between gap-4">
          <div className="flex flex-col gap-1">
            <DialogPrimitive.Title className="text-title-3 text-ink">{title}</DialogPrimitive.Title>
            {description && (
              <DialogPrimitive.Description className="text-body-sm text-ink-muted">
                {description}
              </DialogPrimitive.Description>
            )}
          </div>
          <DialogPrimitive.Close
            aria-label="Close"
            className="-mt-1 -mr-2 inline-grid size-10 shrink-0 place-items-center rounded-control text-ink-muted hover:bg-surface-sunken hover:text-ink"
          >
            <CloseIcon />
          </DialogPrimitive.Close>
        </div>
        {children}
      </DialogPrimitive.Content>
    </DialogPrimitive.Portal>
  );
}

/** Right-aligned row of dialog actions; stacks on narrow screens. */
export function DialogFooter({ className, ...props }: ComponentProps<"div">) {
  return <div className={cx("mt-2 flex flex-col-reverse gap-3 sm:flex-row sm:justify-end", className)} {...props} />;
}
