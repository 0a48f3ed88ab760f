import Link from "next/link";
import type { ComponentProps } from "react";
import { buttonClassName, type ButtonStyleOptions } from "./button";

export type LinkButtonProps = ComponentProps<typeof Link> & Omit<ButtonStyleOptions, "className">;

/** Navigation that looks like a button. It is still a link: Enter follows it, and it is announced as a link. */
export function LinkButton({ variant = "secondary", size, className, ...props }: LinkButtonProps) {
  return <Link className={buttonClassName({ variant, size, className })} {...props} />;
}
