"use client";

import type { MouseEvent } from "react";
import { useFormStatus } from "react-dom";
import { Button, type ButtonProps } from "./button";

export type SubmitButtonProps = Omit<ButtonProps, "type" | "loading">;

/**
 * The submit button of a server-action form: shows the loading state while the action runs
 * and ignores further presses (including Enter in a field, which "clicks" the default button).
 */
export function SubmitButton({ onClick, ...props }: SubmitButtonProps) {
  const { pending } = useFormStatus();

  function guardWhilePending(event: MouseEvent<HTMLButtonElement>) {
    if (pending) {
      event.preventDefault();
      return;
    }
    onClick?.(event);
  }

  return <Button type="submit" loading={pending} onClick={guardWhilePending} {...props} />;
}
